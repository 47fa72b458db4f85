import type { AreaUnit, WeightKind } from './utils/density-unit';

/** A percent-volume level as the API reports it on a surface (threshold per km²). */
export type SurfaceThreshold = { percent: number; threshold: number; areaKm2: number; clipped: boolean };

/** The fields of a demand surface (`GET …/surfaces/:id`) the map reads; the full API object fits. */
export type MapSurface = {
  id: string;
  name: string;
  status: 'queued' | 'running' | 'succeeded' | 'failed' | 'cancelled';
  customerFileId: string | null;
  params: { unit: AreaUnit };
  thresholds: SurfaceThreshold[] | null;
};

/** The fields of the surface's customer file the legend needs (`GET …/customer-files/:id`). */
export type MapCustomerFile = { id: string; name: string; weightKind: WeightKind; weightLabel: string | null };

/**
 * The legend's weight words without a customer file: what the weight counts and the analyst's label
 * for it (e.g. `{ kind: 'other', label: 'annual spend (€)' }`); a `count` kind reads "customers".
 */
export type MapWeight = { kind: WeightKind; label: string | null };

/** Where the map's requests go: the organization and workspace of the study. */
export type MapScope = { orgId: string; workspaceId: string };

/** The three kinds of site a study places on the map. */
export type MapSiteKind = 'candidate' | 'own' | 'competitor';

/**
 * A site as the map draws it. `label` replaces the name beside the symbol when given (e.g. a rank
 * such as "#2" from the scoring step).
 */
export type MapSite = { id: string; name: string; kind: MapSiteKind; lon: number; lat: number; label?: string };

/** A position picked or dragged on the map, WGS84 degrees. */
export type MapLonLat = { lon: number; lat: number };

import type { Feature, FeatureCollection, Point } from 'geojson';
import type { MapSite, MapSiteKind } from '../types';
import { siteSymbolSpecs } from './site-symbols';

/** Properties of each site feature the map's layers read. */
export type SiteFeatureProperties = {
  id: string;
  kind: MapSiteKind;
  name: string;
  /** What is written beside the symbol: the label (e.g. a rank) or else the name. */
  text: string;
  /** The image id of the kind's symbol (added with `map.addImage`). */
  icon: string;
  /** Draw order (higher on top). */
  order: number;
};

/**
 * The image id under which a kind's symbol is added to the map.
 * @param kind site kind
 * @returns the id
 * @example siteIconId('own') // 'ds-site-own'
 */
export function siteIconId(kind: MapSiteKind): string {
  return `ds-site-${kind}`;
}

/**
 * The sites as a GeoJSON FeatureCollection of Points (WGS84 lon/lat) for the sites layer. Sites with
 * coordinates that are not finite or out of range are left out rather than drawn at 0, 0.
 * @param sites the sites
 * @returns one Point feature per drawable site, its `id` also in the properties
 * @example siteFeatureCollection([{ id: 's1', name: 'Quay corner', kind: 'candidate', lon: -38.51, lat: 44.52, label: '#1' }])
 */
export function siteFeatureCollection(sites: readonly MapSite[]): FeatureCollection<Point, SiteFeatureProperties> {
  const features: Array<Feature<Point, SiteFeatureProperties>> = [];
  for (const site of sites) {
    if (!Number.isFinite(site.lon) || !Number.isFinite(site.lat) || Math.abs(site.lon) > 180 || Math.abs(site.lat) > 90) continue;
    features.push({
      type: 'Feature',
      id: site.id,
      geometry: { type: 'Point', coordinates: [site.lon, site.lat] },
      properties: {
        id: site.id,
        kind: site.kind,
        name: site.name,
        text: site.label?.trim() ? site.label : site.name,
        icon: siteIconId(site.kind),
        order: siteSymbolSpecs[site.kind].order,
      },
    });
  }
  return { type: 'FeatureCollection', features };
}

/**
 * The same collection with one site moved (the live position while it is dragged).
 * @param collection the drawn collection
 * @param id the site being dragged
 * @param lonLat its position under the pointer
 * @returns a new collection; the others' features are shared
 * @example siteFeatureMoved(collection, 's1', { lon: -38.5, lat: 44.51 })
 */
export function siteFeatureMoved(
  collection: FeatureCollection<Point, SiteFeatureProperties>,
  id: string,
  lonLat: { lon: number; lat: number },
): FeatureCollection<Point, SiteFeatureProperties> {
  return {
    ...collection,
    features: collection.features.map((f) => (f.properties.id === id ? { ...f, geometry: { type: 'Point', coordinates: [lonLat.lon, lonLat.lat] } } : f)),
  };
}

/** Smallest span (degrees) of the box fitted around sites, so one site does not zoom to street level. */
const MIN_SPAN_DEG = 0.03;
const EDGE_SHARE = 0.2;

/**
 * The box to fit the map to when there is no surface: around all drawable sites with a fifth of
 * their span to spare on each side, at least ~3 km wide.
 * @param sites the sites
 * @returns west, south, east, north, or null without drawable sites
 * @example siteBounds([{ …, lon: -38.5, lat: 44.5 }]) // [-38.515, 44.485, -38.485, 44.515]
 */
export function siteBounds(sites: readonly MapSite[]): [number, number, number, number] | null {
  const points = siteFeatureCollection(sites).features.map((f) => f.geometry.coordinates);
  if (points.length === 0) return null;
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const [lon, lat] of points) {
    w = Math.min(w, lon!);
    e = Math.max(e, lon!);
    s = Math.min(s, lat!);
    n = Math.max(n, lat!);
  }
  // A fifth of the span on each side keeps edge sites' symbols and labels inside the view.
  const padLon = Math.max(0, (MIN_SPAN_DEG - (e - w)) / 2) + (e - w) * EDGE_SHARE;
  const padLat = Math.max(0, (MIN_SPAN_DEG - (n - s)) / 2) + (n - s) * EDGE_SHARE;
  return [w - padLon, s - padLat, e + padLon, n + padLat];
}

/**
 * Which sites get a written label, most important first: the selected one, those with an explicit
 * label (e.g. ranked ones), candidates, own stores, competitors. At most `max` (HTML labels are cheap
 * in dozens, not in thousands); the map then hides any that would print over one before it.
 * @param sites the sites
 * @param selectedId the selected site
 * @param max most labels drawn
 * @returns the sites to label, in priority order
 * @example siteLabelsShown(sites, 's1', 300)
 */
export function siteLabelsShown(sites: readonly MapSite[], selectedId: string | null | undefined, max = 300): MapSite[] {
  const rank = (s: MapSite) => (s.id === selectedId ? 0 : s.label?.trim() ? 1 : 5 - siteSymbolSpecs[s.kind].order);
  return [...sites].sort((a, b) => rank(a) - rank(b)).slice(0, max);
}

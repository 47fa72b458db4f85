import type { ShortlistVersion } from '../types';

/** A site for the map's sites layer (same fields as the map feature's `MapSite`). */
export type ShortlistMapSite = { id: string; name: string; kind: 'candidate' | 'own' | 'competitor'; lon: number; lat: number; label?: string };

/**
 * The sites a shortlist version puts on the map: its chosen candidates labelled with their order number,
 * then the own stores and competitors the run scored against. No customer data is involved.
 * @param version the shortlist version
 * @returns the map sites
 * @example shortlistMapSites(shortlist.version)[0] // { id: 'site_4', kind: 'candidate', label: '1', … }
 */
export function shortlistMapSites(version: Pick<ShortlistVersion, 'items' | 'ownStores' | 'competitors'>): ShortlistMapSite[] {
  const candidates = [...version.items]
    .sort((a, b) => a.order - b.order)
    .map((i): ShortlistMapSite => ({ id: i.siteId, name: i.name, kind: 'candidate', lon: i.lon, lat: i.lat, label: String(i.order) }));
  const own = version.ownStores.map((s): ShortlistMapSite => ({ id: s.siteId, name: s.name, kind: 'own', lon: s.lon, lat: s.lat }));
  const competitors = version.competitors.map((s): ShortlistMapSite => ({ id: s.siteId, name: s.name, kind: 'competitor', lon: s.lon, lat: s.lat }));
  return [...candidates, ...own, ...competitors];
}

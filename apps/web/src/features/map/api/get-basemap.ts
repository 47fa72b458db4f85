import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FeatureCollection, Geometry } from 'geojson';

/** The demo basemap's features; `layer` says how each is drawn (see infra/basemap). */
export type DemoBasemap = FeatureCollection<Geometry, { layer: string; name?: string; kind?: string }>;

/** Where the app serves the generated demo basemap (apps/web/public/basemap). */
export const DEMO_BASEMAP_URL = '/basemap/quillport.geojson';

/**
 * Loads the offline demo basemap shipped with the app (a static file, not an API call).
 * @returns the GeoJSON
 * @example const basemap = await getDemoBasemap();
 */
export async function getDemoBasemap(): Promise<DemoBasemap> {
  const response = await fetch(new URL(DEMO_BASEMAP_URL, globalThis.location?.origin ?? 'http://localhost'));
  if (!response.ok) throw new Error(`The demo basemap (${DEMO_BASEMAP_URL}) did not load (HTTP ${response.status}); rebuild the web app.`);
  return (await response.json()) as DemoBasemap;
}

/**
 * Query options for the demo basemap (a build asset: never stale).
 * @returns options keyed `['demo-basemap']`
 * @example useQuery(getDemoBasemapQueryOptions())
 */
export function getDemoBasemapQueryOptions() {
  return queryOptions({ queryKey: ['demo-basemap'], queryFn: getDemoBasemap, staleTime: Infinity });
}

/**
 * The demo basemap in a component.
 * @param enabled false when a production style URL replaces it
 * @returns the query result
 * @example const basemap = useDemoBasemap(!styleUrl);
 */
export function useDemoBasemap(enabled: boolean) {
  return useQuery({ ...getDemoBasemapQueryOptions(), enabled });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FeatureCollection, MultiPolygon, Polygon, MultiLineString, LineString } from 'geojson';
import { api } from '../../../lib/api-client';
import type { AreaUnit } from '../utils/density-unit';
import type { MapScope } from '../types';

/** Percent-volume contours in lon/lat; `threshold` in the surface's unit. */
export type SurfaceContours = FeatureCollection<
  Polygon | MultiPolygon | LineString | MultiLineString,
  { percent: number; threshold: number; unit: AreaUnit; areaKm2?: number; clipped?: boolean }
>;

/**
 * The 50/75/90 % percent-volume contours of a succeeded surface.
 * @param scope organization and workspace
 * @param surfaceId the surface
 * @returns a GeoJSON FeatureCollection
 * @example const contours = await getSurfaceContours(scope, id);
 */
export function getSurfaceContours(scope: MapScope, surfaceId: string): Promise<SurfaceContours> {
  return api.get<SurfaceContours>(`/organizations/${scope.orgId}/workspaces/${scope.workspaceId}/surfaces/${surfaceId}/contours`);
}

/**
 * Query options for a surface's contours.
 * @param scope organization and workspace
 * @param surfaceId the surface
 * @returns options keyed `[…, 'surfaces', surfaceId, 'contours']`
 * @example useQuery(getSurfaceContoursQueryOptions(scope, id))
 */
export function getSurfaceContoursQueryOptions(scope: MapScope, surfaceId: string) {
  return queryOptions({
    queryKey: ['organizations', scope.orgId, 'workspaces', scope.workspaceId, 'surfaces', surfaceId, 'contours'],
    queryFn: () => getSurfaceContours(scope, surfaceId),
    staleTime: Infinity,
  });
}

/**
 * A surface's contours in a component.
 * @param scope organization and workspace
 * @param surfaceId the surface, or null for none
 * @returns the query result
 * @example const contours = useSurfaceContours(scope, surface.id);
 */
export function useSurfaceContours(scope: MapScope, surfaceId: string | null) {
  return useQuery({ ...getSurfaceContoursQueryOptions(scope, surfaceId ?? ''), enabled: surfaceId !== null });
}

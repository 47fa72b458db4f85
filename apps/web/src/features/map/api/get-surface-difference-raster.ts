import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MapScope } from '../types';
import { WEB_RASTER_MAX_SIZE } from './get-surface-web-raster';
import { rasterRequest } from './raster-request';

/**
 * The difference `other − surface`, resampled onto the surface's Web Mercator grid (same format as the web raster).
 * @param scope organization and workspace
 * @param surfaceId the surface the map shows
 * @param otherId the surface to compare with
 * @param signal abort signal
 * @returns the difference raster (negative where the other surface has less demand)
 * @example const diff = await getSurfaceDifferenceRaster(scope, a.id, b.id);
 */
export function getSurfaceDifferenceRaster(scope: MapScope, surfaceId: string, otherId: string, signal?: AbortSignal) {
  return rasterRequest(
    `/organizations/${scope.orgId}/workspaces/${scope.workspaceId}/surfaces/${surfaceId}/difference/${otherId}/web-raster`,
    { maxSize: WEB_RASTER_MAX_SIZE },
    signal,
  );
}

/**
 * Query options for a difference raster.
 * @param scope organization and workspace
 * @param surfaceId the surface the map shows
 * @param otherId the compared surface
 * @returns options keyed `[…, 'surfaces', surfaceId, 'difference', otherId]`
 * @example useQuery(getSurfaceDifferenceRasterQueryOptions(scope, a, b))
 */
export function getSurfaceDifferenceRasterQueryOptions(scope: MapScope, surfaceId: string, otherId: string) {
  return queryOptions({
    queryKey: ['organizations', scope.orgId, 'workspaces', scope.workspaceId, 'surfaces', surfaceId, 'difference', otherId],
    queryFn: ({ signal }) => getSurfaceDifferenceRaster(scope, surfaceId, otherId, signal),
    staleTime: Infinity,
  });
}

/**
 * A difference raster in a component.
 * @param scope organization and workspace
 * @param surfaceId the surface the map shows
 * @param otherId the compared surface, or null for none
 * @returns the query result
 * @example const diff = useSurfaceDifferenceRaster(scope, surface.id, compareId);
 */
export function useSurfaceDifferenceRaster(scope: MapScope, surfaceId: string, otherId: string | null) {
  return useQuery({ ...getSurfaceDifferenceRasterQueryOptions(scope, surfaceId, otherId ?? ''), enabled: otherId !== null });
}

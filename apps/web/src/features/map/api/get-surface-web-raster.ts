import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MapScope } from '../types';
import { rasterRequest } from './raster-request';

/** Largest side of the fetched raster in pixels: sharp on a laptop screen, ≤ 4 MB of Float32. */
export const WEB_RASTER_MAX_SIZE = 1024;

const base = (scope: MapScope) => `/organizations/${scope.orgId}/workspaces/${scope.workspaceId}/surfaces`;

/**
 * A succeeded surface resampled to Web Mercator (Float32, row 0 = north).
 * @param scope organization and workspace
 * @param surfaceId the surface
 * @param signal abort signal
 * @returns the raster with bounds, unit and maximum
 * @example const raster = await getSurfaceWebRaster({ orgId, workspaceId }, surfaceId);
 */
export function getSurfaceWebRaster(scope: MapScope, surfaceId: string, signal?: AbortSignal) {
  return rasterRequest(`${base(scope)}/${surfaceId}/web-raster`, { maxSize: WEB_RASTER_MAX_SIZE }, signal);
}

/**
 * Query options for a surface's web raster (results of a run never change, so it stays fresh).
 * @param scope organization and workspace
 * @param surfaceId the surface
 * @returns options keyed `['organizations', orgId, 'workspaces', workspaceId, 'surfaces', surfaceId, 'web-raster']`
 * @example queryClient.ensureQueryData(getSurfaceWebRasterQueryOptions(scope, id))
 */
export function getSurfaceWebRasterQueryOptions(scope: MapScope, surfaceId: string) {
  return queryOptions({
    queryKey: ['organizations', scope.orgId, 'workspaces', scope.workspaceId, 'surfaces', surfaceId, 'web-raster'],
    queryFn: ({ signal }) => getSurfaceWebRaster(scope, surfaceId, signal),
    staleTime: Infinity,
  });
}

/**
 * A surface's web raster in a component.
 * @param scope organization and workspace
 * @param surfaceId the surface, or null to fetch nothing
 * @returns the query result
 * @example const raster = useSurfaceWebRaster(scope, surface.id);
 */
export function useSurfaceWebRaster(scope: MapScope, surfaceId: string | null) {
  return useQuery({ ...getSurfaceWebRasterQueryOptions(scope, surfaceId ?? ''), enabled: surfaceId !== null });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Surface } from '../types';

/**
 * The query key every surface query of a workspace starts with.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key prefix
 * @example queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId) })
 */
export function surfacesKey(orgId: string, workspaceId: string) {
  return ['organizations', orgId, 'workspaces', workspaceId, 'surfaces'] as const;
}

/**
 * The API path of a workspace's surfaces.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(surfacesPath(orgId, workspaceId))
 */
export function surfacesPath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}/surfaces`;
}

/**
 * A workspace's demand-surface runs (no rasters).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the runs
 * @example const runs = await getSurfaces(orgId, workspaceId);
 */
export async function getSurfaces(orgId: string, workspaceId: string): Promise<Surface[]> {
  const body = await api.get<{ surfaces: Surface[] }>(surfacesPath(orgId, workspaceId));
  return body.surfaces;
}

/**
 * Query options for the run list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'surfaces']`
 * @example queryClient.prefetchQuery(getSurfacesQueryOptions(orgId, workspaceId))
 */
export function getSurfacesQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({ queryKey: surfacesKey(orgId, workspaceId), queryFn: () => getSurfaces(orgId, workspaceId) });
}

/**
 * The run list in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: surfaces } = useSurfaces(orgId, workspaceId);
 */
export function useSurfaces(orgId: string, workspaceId: string) {
  return useQuery(getSurfacesQueryOptions(orgId, workspaceId));
}

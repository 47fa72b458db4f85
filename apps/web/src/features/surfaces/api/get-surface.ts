import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Surface } from '../types';
import { surfacesKey, surfacesPath } from './get-surfaces';

/** How often a queued or running surface is polled, in milliseconds. */
export const SURFACE_POLL_MS = 1000;

/**
 * Whether a run may still change on its own (queued or running).
 * @param surface the run
 * @returns true while it is worth polling
 * @example surfaceIsActive({ status: 'running' } as Surface) // true
 */
export function surfaceIsActive(surface: Pick<Surface, 'status'> | undefined): boolean {
  return surface?.status === 'queued' || surface?.status === 'running';
}

/**
 * One demand-surface run.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surfaceId the run
 * @returns the run
 * @example const s = await getSurface(orgId, wsId, surfaceId);
 */
export async function getSurface(orgId: string, workspaceId: string, surfaceId: string): Promise<Surface> {
  const body = await api.get<{ surface: Surface }>(`${surfacesPath(orgId, workspaceId)}/${surfaceId}`);
  return body.surface;
}

/**
 * Query options for one run; polls every second while it is queued or running.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surfaceId the run
 * @returns options keyed `[…, 'surfaces', surfaceId]`
 * @example useQuery(getSurfaceQueryOptions(orgId, wsId, id))
 */
export function getSurfaceQueryOptions(orgId: string, workspaceId: string, surfaceId: string) {
  return queryOptions({
    queryKey: [...surfacesKey(orgId, workspaceId), surfaceId],
    queryFn: () => getSurface(orgId, workspaceId, surfaceId),
    refetchInterval: (query) => (surfaceIsActive(query.state.data) ? SURFACE_POLL_MS : false),
  });
}

/**
 * One run in a component, seeded from the list so it shows at once, then polled while active.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surface the run as the list returned it
 * @returns the query result (data is never undefined)
 * @example const { data } = useSurface(orgId, wsId, listItem);
 */
export function useSurface(orgId: string, workspaceId: string, surface: Surface) {
  return useQuery({
    ...getSurfaceQueryOptions(orgId, workspaceId, surface.id),
    initialData: surface,
    // The list copy may be old: fetch at once when the run is still active.
    initialDataUpdatedAt: surfaceIsActive(surface) ? 0 : Date.now(),
  });
}

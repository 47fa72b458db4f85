import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SurfaceCreateBody, SurfaceEstimate } from '../types';
import { surfacesKey, surfacesPath } from './get-surfaces';

/**
 * What a run with these inputs would use and cost (bandwidth, cell size, grid, credits, warnings),
 * without queueing it. A 400 carries the engine's message (e.g. GRID_TOO_LARGE with details.suggestedCellSize).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the create body
 * @returns the estimate
 * @example const e = await estimateSurface(orgId, wsId, body);
 */
export async function estimateSurface(orgId: string, workspaceId: string, body: SurfaceCreateBody): Promise<SurfaceEstimate> {
  return api.post<SurfaceEstimate>(`${surfacesPath(orgId, workspaceId)}/estimate`, body);
}

/**
 * Query options for the live estimate, keyed by the body so each distinct input is asked once.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the create body, or null while the form is incomplete
 * @returns options (disabled without a body)
 * @example useQuery(estimateSurfaceQueryOptions(orgId, wsId, debouncedBody))
 */
export function estimateSurfaceQueryOptions(orgId: string, workspaceId: string, body: SurfaceCreateBody | null) {
  return queryOptions({
    queryKey: [...surfacesKey(orgId, workspaceId), 'estimate', body],
    queryFn: () => estimateSurface(orgId, workspaceId, body as SurfaceCreateBody),
    enabled: body !== null,
    staleTime: 60_000,
    retry: false,
    placeholderData: keepPreviousData,
  });
}

/**
 * The live estimate in a component (the caller debounces the body).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the create body, or null
 * @returns the query result
 * @example const estimate = useSurfaceEstimate(orgId, wsId, debouncedBody);
 */
export function useSurfaceEstimate(orgId: string, workspaceId: string, body: SurfaceCreateBody | null) {
  return useQuery(estimateSurfaceQueryOptions(orgId, workspaceId, body));
}

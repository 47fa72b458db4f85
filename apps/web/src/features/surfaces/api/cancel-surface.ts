import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Surface } from '../types';
import { getSurfaceQueryOptions } from './get-surface';
import { surfacesKey, surfacesPath } from './get-surfaces';

/**
 * Stops a queued or running surface; its reserved credits are released.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surfaceId the run
 * @returns the run as it is now
 * @example await cancelSurface(orgId, wsId, surfaceId);
 */
export async function cancelSurface(orgId: string, workspaceId: string, surfaceId: string): Promise<Surface> {
  const body = await api.post<{ surface: Surface }>(`${surfacesPath(orgId, workspaceId)}/${surfaceId}/cancel`);
  return body.surface;
}

/**
 * Mutation for cancelSurface; updates the cached run (polling resumes while it is active) and the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the run id)
 * @example useCancelSurface(orgId, wsId).mutate(surfaceId)
 */
export function useCancelSurface(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (surfaceId: string) => cancelSurface(orgId, workspaceId, surfaceId),
    onSuccess: async (surface) => {
      queryClient.setQueryData(getSurfaceQueryOptions(orgId, workspaceId, surface.id).queryKey, surface);
      await queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId), exact: true });
    },
  });
}

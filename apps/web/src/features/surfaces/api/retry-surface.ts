import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Surface } from '../types';
import { getSurfaceQueryOptions } from './get-surface';
import { surfacesKey, surfacesPath } from './get-surfaces';

/**
 * Queues a failed or cancelled surface again with the same inputs.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surfaceId the run
 * @returns the run as it is now
 * @example await retrySurface(orgId, wsId, surfaceId);
 */
export async function retrySurface(orgId: string, workspaceId: string, surfaceId: string): Promise<Surface> {
  const body = await api.post<{ surface: Surface }>(`${surfacesPath(orgId, workspaceId)}/${surfaceId}/retry`);
  return body.surface;
}

/**
 * Mutation for retrySurface; updates the cached run (polling resumes while it is active) and the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the run id)
 * @example useRetrySurface(orgId, wsId).mutate(surfaceId)
 */
export function useRetrySurface(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (surfaceId: string) => retrySurface(orgId, workspaceId, surfaceId),
    onSuccess: async (surface) => {
      queryClient.setQueryData(getSurfaceQueryOptions(orgId, workspaceId, surface.id).queryKey, surface);
      await queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId), exact: true });
    },
  });
}

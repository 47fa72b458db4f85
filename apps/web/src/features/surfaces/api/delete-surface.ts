import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { surfacesKey, surfacesPath } from './get-surfaces';

/**
 * Deletes a demand-surface run and its results.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param surfaceId the run
 * @returns nothing
 * @example await deleteSurface(orgId, wsId, surfaceId);
 */
export async function deleteSurface(orgId: string, workspaceId: string, surfaceId: string): Promise<void> {
  await api.delete(`${surfacesPath(orgId, workspaceId)}/${surfaceId}`);
}

/**
 * Mutation that deletes a run, drops its cached copy and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the run id)
 * @example useDeleteSurface(orgId, wsId).mutate(surfaceId)
 */
export function useDeleteSurface(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (surfaceId: string) => deleteSurface(orgId, workspaceId, surfaceId),
    onSuccess: async (_data, surfaceId) => {
      queryClient.removeQueries({ queryKey: [...surfacesKey(orgId, workspaceId), surfaceId] });
      await queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId), exact: true });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Deletes a workspace.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns nothing
 * @example await deleteWorkspace(orgId, workspaceId);
 */
export async function deleteWorkspace(orgId: string, workspaceId: string): Promise<void> {
  await api.delete(`/organizations/${orgId}/workspaces/${workspaceId}`);
}

/**
 * Mutation that deletes a workspace, drops its cached copy and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useDeleteWorkspace(orgId, id, { onSuccess: () => navigate(paths.org.workspaces.getHref(orgId)) })
 */
export function useDeleteWorkspace(orgId: string, workspaceId: string, config: MutationConfig<void, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    ...config,
    mutationFn: () => deleteWorkspace(orgId, workspaceId),
    onSuccess: async (...args) => {
      queryClient.removeQueries({ queryKey: ['organizations', orgId, 'workspaces', workspaceId] });
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'workspaces'], exact: true });
      await config.onSuccess?.(...args);
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { orgShortlistsKey } from './get-org-shortlists';
import { shortlistsKey, shortlistsPath } from './get-shortlists';

/**
 * Deletes a shortlist with all its versions.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @returns nothing
 * @example await deleteShortlist(orgId, wsId, id);
 */
export async function deleteShortlist(orgId: string, workspaceId: string, shortlistId: string): Promise<void> {
  await api.delete(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}`);
}

/**
 * Mutation that deletes a shortlist, drops its cached versions and refreshes the lists.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation (variable: the shortlist id)
 * @example useDeleteShortlist(orgId, wsId).mutate(id)
 */
export function useDeleteShortlist(orgId: string, workspaceId: string, config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    ...config,
    mutationFn: (shortlistId: string) => deleteShortlist(orgId, workspaceId, shortlistId),
    onSuccess: async (...args) => {
      queryClient.removeQueries({ queryKey: [...shortlistsKey(orgId, workspaceId), args[1]] });
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: [...shortlistsKey(orgId, workspaceId), 'list'] }),
        queryClient.invalidateQueries({ queryKey: orgShortlistsKey(orgId) }),
      ]);
      await config.onSuccess?.(...args);
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { customerFilesKey, customerFilesPath } from './get-customer-files';

/**
 * Deletes a customer file and its points (409 IN_USE while a queued or running surface uses it).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns nothing
 * @example await deleteCustomerFile(orgId, wsId, fileId);
 */
export async function deleteCustomerFile(orgId: string, workspaceId: string, fileId: string): Promise<void> {
  await api.delete(`${customerFilesPath(orgId, workspaceId)}/${fileId}`);
}

/**
 * Mutation that deletes a customer file and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation (variable: the file id)
 * @example useDeleteCustomerFile(orgId, wsId, { onSuccess: close }).mutate(fileId)
 */
export function useDeleteCustomerFile(orgId: string, workspaceId: string, config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (fileId: string) => deleteCustomerFile(orgId, workspaceId, fileId),
    onSuccess: async (...args) => {
      queryClient.removeQueries({ queryKey: [...customerFilesKey(orgId, workspaceId), args[1]] });
      await queryClient.invalidateQueries({ queryKey: customerFilesKey(orgId, workspaceId), exact: true });
      await config.onSuccess?.(...args);
    },
  });
}


import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { sitesKey, sitesPath } from './get-sites';

/**
 * Deletes a site.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param siteId the site
 * @returns nothing
 * @example await deleteSite(orgId, wsId, siteId);
 */
export async function deleteSite(orgId: string, workspaceId: string, siteId: string): Promise<void> {
  await api.delete(`${sitesPath(orgId, workspaceId)}/${siteId}`);
}

/**
 * Mutation that deletes a site and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation (variable: the site id)
 * @example useDeleteSite(orgId, wsId, { onSuccess: close }).mutate(siteId)
 */
export function useDeleteSite(orgId: string, workspaceId: string, config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (siteId: string) => deleteSite(orgId, workspaceId, siteId),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: sitesKey(orgId, workspaceId) });
      await config.onSuccess?.(...args);
    },
  });
}

import type { QueryClient } from '@tanstack/react-query';
import { orgShortlistsKey } from './get-org-shortlists';
import { shortlistsKey } from './get-shortlists';

/**
 * Refetches every cached shortlist query of a workspace (lists and versions) and the organization-wide list,
 * after anything that changes a shortlist.
 * @param queryClient the app's query client
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns when the active queries have refetched
 * @example await shortlistsRefresh(queryClient, orgId, workspaceId);
 */
export async function shortlistsRefresh(queryClient: QueryClient, orgId: string, workspaceId: string): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: shortlistsKey(orgId, workspaceId) }),
    queryClient.invalidateQueries({ queryKey: orgShortlistsKey(orgId) }),
  ]);
}

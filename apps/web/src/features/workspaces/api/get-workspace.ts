import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Workspace } from '../../../types/api';

/**
 * One workspace.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the workspace (404 ApiError when it does not exist or belongs elsewhere)
 * @example const workspace = await getWorkspace(orgId, workspaceId);
 */
export async function getWorkspace(orgId: string, workspaceId: string): Promise<Workspace> {
  const body = await api.get<{ workspace: Workspace }>(`/organizations/${orgId}/workspaces/${workspaceId}`);
  return body.workspace;
}

/**
 * Query options for one workspace.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `['organizations', orgId, 'workspaces', workspaceId]`
 * @example queryClient.ensureQueryData(getWorkspaceQueryOptions(orgId, workspaceId))
 */
export function getWorkspaceQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({
    queryKey: ['organizations', orgId, 'workspaces', workspaceId],
    queryFn: () => getWorkspace(orgId, workspaceId),
  });
}

/**
 * One workspace in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: workspace } = useWorkspace(orgId, workspaceId);
 */
export function useWorkspace(orgId: string, workspaceId: string) {
  return useQuery(getWorkspaceQueryOptions(orgId, workspaceId));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Workspace } from '../../../types/api';

/**
 * An organization's workspaces (site-selection studies).
 * @param orgId the organization
 * @returns the workspaces
 * @example const workspaces = await getWorkspaces(orgId);
 */
export async function getWorkspaces(orgId: string): Promise<Workspace[]> {
  const body = await api.get<{ workspaces: Workspace[] }>(`/organizations/${orgId}/workspaces`);
  return body.workspaces;
}

/**
 * Query options for an organization's workspaces.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'workspaces']`
 * @example queryClient.ensureQueryData(getWorkspacesQueryOptions(orgId))
 */
export function getWorkspacesQueryOptions(orgId: string) {
  return queryOptions({ queryKey: ['organizations', orgId, 'workspaces'], queryFn: () => getWorkspaces(orgId) });
}

/**
 * Workspaces in a component.
 * @param orgId the organization
 * @returns the query result
 * @example const { data: workspaces } = useWorkspaces(orgId);
 */
export function useWorkspaces(orgId: string) {
  return useQuery(getWorkspacesQueryOptions(orgId));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ShortlistSummary } from '../types';

/**
 * The query key every shortlist query of a workspace starts with.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key prefix
 * @example queryClient.invalidateQueries({ queryKey: shortlistsKey(orgId, workspaceId) })
 */
export function shortlistsKey(orgId: string, workspaceId: string) {
  return ['organizations', orgId, 'workspaces', workspaceId, 'shortlists'] as const;
}

/**
 * The API path of a workspace's shortlists.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(shortlistsPath(orgId, workspaceId))
 */
export function shortlistsPath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}/shortlists`;
}

/**
 * A workspace's shortlists (latest version of each, without items).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the shortlists
 * @example const lists = await getShortlists(orgId, workspaceId);
 */
export async function getShortlists(orgId: string, workspaceId: string): Promise<ShortlistSummary[]> {
  const body = await api.get<{ shortlists: ShortlistSummary[] }>(shortlistsPath(orgId, workspaceId));
  return body.shortlists;
}

/**
 * Query options for a workspace's shortlist list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'shortlists', 'list']`
 * @example queryClient.prefetchQuery(getShortlistsQueryOptions(orgId, workspaceId))
 */
export function getShortlistsQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({ queryKey: [...shortlistsKey(orgId, workspaceId), 'list'], queryFn: () => getShortlists(orgId, workspaceId) });
}

/**
 * A workspace's shortlists in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: shortlists } = useShortlists(orgId, workspaceId);
 */
export function useShortlists(orgId: string, workspaceId: string) {
  return useQuery(getShortlistsQueryOptions(orgId, workspaceId));
}

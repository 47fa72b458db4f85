import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Site } from '../types';

/**
 * The query key of a workspace's site list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key
 * @example queryClient.invalidateQueries({ queryKey: sitesKey(orgId, workspaceId) })
 */
export function sitesKey(orgId: string, workspaceId: string) {
  return ['organizations', orgId, 'workspaces', workspaceId, 'sites'] as const;
}

/**
 * The API path of a workspace's sites.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(sitesPath(orgId, workspaceId))
 */
export function sitesPath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}/sites`;
}

/**
 * A workspace's sites (candidates, own stores, competitors), by kind then name.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the sites
 * @example const sites = await getSites(orgId, workspaceId);
 */
export async function getSites(orgId: string, workspaceId: string): Promise<Site[]> {
  const body = await api.get<{ sites: Site[] }>(sitesPath(orgId, workspaceId));
  return body.sites;
}

/**
 * Query options for the site list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'sites']`
 * @example queryClient.prefetchQuery(getSitesQueryOptions(orgId, workspaceId))
 */
export function getSitesQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({ queryKey: sitesKey(orgId, workspaceId), queryFn: () => getSites(orgId, workspaceId) });
}

/**
 * The site list in a component; pass `enabled: false` for roles the server refuses (executives).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param enabled whether to load
 * @returns the query result
 * @example const { data: sites } = useSites(orgId, workspaceId, roleCan(role, 'site:read'));
 */
export function useSites(orgId: string, workspaceId: string, enabled = true) {
  return useQuery({ ...getSitesQueryOptions(orgId, workspaceId), enabled });
}

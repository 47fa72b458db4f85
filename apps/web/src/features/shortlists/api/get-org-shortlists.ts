import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ShortlistSummary } from '../types';

/**
 * The query key of the organization-wide shortlist list.
 * @param orgId the organization
 * @returns the key
 * @example queryClient.invalidateQueries({ queryKey: orgShortlistsKey(orgId) })
 */
export function orgShortlistsKey(orgId: string) {
  return ['organizations', orgId, 'shortlists'] as const;
}

/**
 * Every shortlist of the organization, across its workspaces (the executive's list).
 * @param orgId the organization
 * @returns the shortlists with their workspace names
 * @example const lists = await getOrgShortlists(orgId);
 */
export async function getOrgShortlists(orgId: string): Promise<ShortlistSummary[]> {
  const body = await api.get<{ shortlists: ShortlistSummary[] }>(`/organizations/${orgId}/shortlists`);
  return body.shortlists;
}

/**
 * Query options for the organization-wide list.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'shortlists']`
 * @example await queryClient.ensureQueryData(getOrgShortlistsQueryOptions(orgId))
 */
export function getOrgShortlistsQueryOptions(orgId: string) {
  return queryOptions({ queryKey: orgShortlistsKey(orgId), queryFn: () => getOrgShortlists(orgId) });
}

/**
 * The organization-wide list in a component.
 * @param orgId the organization
 * @returns the query result
 * @example const { data } = useOrgShortlists(orgId);
 */
export function useOrgShortlists(orgId: string) {
  return useQuery(getOrgShortlistsQueryOptions(orgId));
}

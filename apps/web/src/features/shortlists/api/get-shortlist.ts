import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Shortlist } from '../types';
import { shortlistsKey, shortlistsPath } from './get-shortlists';

/**
 * One shortlist with one of its versions (the latest unless `version` is given).
 * @param orgId the organization
 * @param workspaceId the shortlist's workspace
 * @param shortlistId the shortlist
 * @param version a version number, or null for the latest
 * @returns the shortlist
 * @example const s = await getShortlist(orgId, wsId, id, 2);
 */
export async function getShortlist(orgId: string, workspaceId: string, shortlistId: string, version: number | null = null): Promise<Shortlist> {
  const body = await api.get<{ shortlist: Shortlist }>(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}`, {
    query: { version: version ?? undefined },
  });
  return body.shortlist;
}

/**
 * Query options for one shortlist version.
 * @param orgId the organization
 * @param workspaceId the shortlist's workspace
 * @param shortlistId the shortlist
 * @param version a version number, or null for the latest
 * @returns options keyed `[…, 'shortlists', shortlistId, version | 'latest']`
 * @example useQuery(getShortlistQueryOptions(orgId, wsId, id, null))
 */
export function getShortlistQueryOptions(orgId: string, workspaceId: string, shortlistId: string, version: number | null = null) {
  return queryOptions({
    queryKey: [...shortlistsKey(orgId, workspaceId), shortlistId, version ?? 'latest'],
    queryFn: () => getShortlist(orgId, workspaceId, shortlistId, version),
  });
}

/**
 * One shortlist version in a component; the previous version stays on screen while another loads.
 * @param orgId the organization
 * @param workspaceId the shortlist's workspace ('' while unknown: nothing is fetched)
 * @param shortlistId the shortlist
 * @param version a version number, or null for the latest
 * @returns the query result
 * @example const { data } = useShortlist(orgId, wsId, id, version);
 */
export function useShortlist(orgId: string, workspaceId: string, shortlistId: string, version: number | null = null) {
  return useQuery({
    ...getShortlistQueryOptions(orgId, workspaceId, shortlistId, version),
    enabled: workspaceId !== '',
    placeholderData: keepPreviousData,
  });
}

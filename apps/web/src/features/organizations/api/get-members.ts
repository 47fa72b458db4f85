import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Member } from '../../../types/api';

/**
 * Everyone in an organization, with their role.
 * @param orgId the organization
 * @returns the members
 * @example const members = await getMembers(orgId);
 */
export async function getMembers(orgId: string): Promise<Member[]> {
  const body = await api.get<{ members: Member[] }>(`/organizations/${orgId}/members`);
  return body.members;
}

/**
 * Query options for an organization's members.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'members']`
 * @example queryClient.prefetchQuery(getMembersQueryOptions(orgId))
 */
export function getMembersQueryOptions(orgId: string) {
  return queryOptions({ queryKey: ['organizations', orgId, 'members'], queryFn: () => getMembers(orgId) });
}

/**
 * Members in a component.
 * @param orgId the organization
 * @returns the query result
 * @example const { data: members } = useMembers(orgId);
 */
export function useMembers(orgId: string) {
  return useQuery(getMembersQueryOptions(orgId));
}

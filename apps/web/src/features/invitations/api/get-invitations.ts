import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Invitation } from '../types';

/**
 * The organization's invitations, newest first (owners only).
 * @param orgId the organization
 * @returns invitations in every status
 * @example const invitations = await getInvitations(orgId);
 */
export async function getInvitations(orgId: string): Promise<Invitation[]> {
  const body = await api.get<{ invitations: Invitation[] }>(`/organizations/${orgId}/invitations`);
  return body.invitations;
}

/**
 * Query options for the invitations.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'invitations']`
 * @example queryClient.prefetchQuery(getInvitationsQueryOptions(orgId))
 */
export function getInvitationsQueryOptions(orgId: string) {
  return queryOptions({ queryKey: ['organizations', orgId, 'invitations'], queryFn: () => getInvitations(orgId) });
}

/**
 * Invitations in a component.
 * @param orgId the organization
 * @returns the query result
 * @example const { data } = useInvitations(orgId);
 */
export function useInvitations(orgId: string) {
  return useQuery(getInvitationsQueryOptions(orgId));
}

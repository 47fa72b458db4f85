import type { QueryClient } from '@tanstack/react-query';
import { getMeQueryOptions } from '../../../features/auth/api/get-me';
import type { Membership } from '../../../types/api';

/**
 * The signed-in user's membership in an organization, from the cached session. Loaders of pages under
 * `/orgs/:orgId` run in parallel with the guard above them, so each asks this before fetching anything.
 * @param queryClient the app's query client
 * @param orgId the organization in the URL
 * @returns the membership, or undefined when signed out or not a member
 * @example if (await orgMembership(queryClient, params.orgId)) void queryClient.prefetchQuery(...);
 */
export async function orgMembership(queryClient: QueryClient, orgId: string | undefined): Promise<Membership | undefined> {
  const me = await queryClient.ensureQueryData(getMeQueryOptions()).catch(() => null);
  return me?.memberships.find((m) => m.organization.id === orgId);
}

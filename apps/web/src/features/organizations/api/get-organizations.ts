import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { OrganizationSummary } from '../../../types/api';

/**
 * The organizations the signed-in user belongs to, with their role in each.
 * @returns the list
 * @example const organizations = await getOrganizations();
 */
export async function getOrganizations(): Promise<OrganizationSummary[]> {
  const body = await api.get<{ organizations: OrganizationSummary[] }>('/organizations');
  return body.organizations;
}

/**
 * Query options for the user's organizations.
 * @returns options keyed `['organizations']`
 * @example queryClient.ensureQueryData(getOrganizationsQueryOptions())
 */
export function getOrganizationsQueryOptions() {
  return queryOptions({ queryKey: ['organizations'], queryFn: getOrganizations });
}

/**
 * The user's organizations in a component.
 * @returns the query result
 * @example const { data: organizations } = useOrganizations();
 */
export function useOrganizations() {
  return useQuery(getOrganizationsQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BillingOverview } from '../types';

/**
 * Plan, seats, credit balance and the packs on sale (owners only).
 * @param orgId the organization
 * @returns the overview
 * @example const { credits } = await getBilling(orgId);
 */
export function getBilling(orgId: string): Promise<BillingOverview> {
  return api.get<BillingOverview>(`/organizations/${orgId}/billing`);
}

/**
 * Query options for the billing overview.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'billing']`
 * @example queryClient.prefetchQuery(getBillingQueryOptions(orgId))
 */
export function getBillingQueryOptions(orgId: string) {
  return queryOptions({ queryKey: ['organizations', orgId, 'billing'], queryFn: () => getBilling(orgId) });
}

/**
 * The billing overview in a component; `pollMs` re-reads it while a payment is on its way.
 * @param orgId the organization
 * @param pollMs refetch interval in milliseconds, or false
 * @returns the query result
 * @example const billing = useBilling(orgId, waiting ? 1000 : false);
 */
export function useBilling(orgId: string, pollMs: number | false = false) {
  return useQuery({ ...getBillingQueryOptions(orgId), refetchInterval: pollMs });
}

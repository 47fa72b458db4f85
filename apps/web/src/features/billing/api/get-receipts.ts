import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Receipt } from '../types';

/**
 * Payments received, newest first.
 * @param orgId the organization
 * @returns the receipts
 * @example const receipts = await getReceipts(orgId);
 */
export async function getReceipts(orgId: string): Promise<Receipt[]> {
  const body = await api.get<{ receipts: Receipt[] }>(`/organizations/${orgId}/billing/receipts`);
  return body.receipts;
}

/**
 * Query options for the receipts.
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'billing', 'receipts']`
 * @example queryClient.prefetchQuery(getReceiptsQueryOptions(orgId))
 */
export function getReceiptsQueryOptions(orgId: string) {
  return queryOptions({ queryKey: ['organizations', orgId, 'billing', 'receipts'], queryFn: () => getReceipts(orgId) });
}

/**
 * Receipts in a component.
 * @param orgId the organization
 * @returns the query result
 * @example const { data: receipts } = useReceipts(orgId);
 */
export function useReceipts(orgId: string) {
  return useQuery(getReceiptsQueryOptions(orgId));
}

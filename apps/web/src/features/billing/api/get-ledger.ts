import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LedgerEntry } from '../types';

export const LEDGER_PAGE_SIZE = 25;

export type LedgerPage = { entries: LedgerEntry[]; nextBefore: number | null };

/**
 * One page of the credits ledger, newest first.
 * @param orgId the organization
 * @param before only entries older than this entry id
 * @returns entries and the cursor of the next older page (null at the end)
 * @example const { entries } = await getLedger(orgId);
 */
export async function getLedger(orgId: string, before: number | null = null): Promise<LedgerPage> {
  const body = await api.get<{ entries: LedgerEntry[]; nextBefore?: number | null }>(`/organizations/${orgId}/billing/ledger`, {
    query: { limit: LEDGER_PAGE_SIZE, before },
  });
  return { entries: body.entries, nextBefore: body.nextBefore ?? null };
}

/**
 * Paged query options for the ledger ("Older entries" loads the next page).
 * @param orgId the organization
 * @returns options keyed `['organizations', orgId, 'billing', 'ledger']`
 * @example useInfiniteQuery(getLedgerQueryOptions(orgId))
 */
export function getLedgerQueryOptions(orgId: string) {
  return infiniteQueryOptions({
    queryKey: ['organizations', orgId, 'billing', 'ledger'],
    queryFn: ({ pageParam }) => getLedger(orgId, pageParam),
    initialPageParam: null as number | null,
    getNextPageParam: (lastPage) => lastPage.nextBefore,
  });
}

/**
 * The ledger in a component.
 * @param orgId the organization
 * @returns the infinite query result
 * @example const ledger = useLedger(orgId);
 */
export function useLedger(orgId: string) {
  return useInfiniteQuery(getLedgerQueryOptions(orgId));
}

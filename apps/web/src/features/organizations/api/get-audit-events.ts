import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AuditEvent } from '../../../types/api';

export const AUDIT_PAGE_SIZE = 50;

/** Actions the server records today, for the filter (contract v1). */
export const auditActions = [
  'auth.sign_in',
  'auth.sign_in_failed',
  'auth.sign_up',
  'auth.sign_out',
  'auth.password_reset',
  'organization.create',
  'organization.rename',
  'workspace.create',
  'workspace.update',
  'workspace.delete',
] as const;

export type AuditEventsPage = { events: AuditEvent[]; nextBefore: string | null };

/**
 * One page of an organization's audit log, newest first.
 * @param orgId the organization
 * @param options `before` (an event id: return older events) and `action` (only this action)
 * @returns events and the cursor for the next older page (null at the end)
 * @example const { events, nextBefore } = await getAuditEvents(orgId, { action: 'workspace.delete' });
 */
export async function getAuditEvents(
  orgId: string,
  options: { before?: string | null; action?: string | null } = {},
): Promise<AuditEventsPage> {
  const body = await api.get<{ events: AuditEvent[]; nextBefore?: string | null }>(`/organizations/${orgId}/audit-events`, {
    query: { limit: AUDIT_PAGE_SIZE, before: options.before, action: options.action },
  });
  return { events: body.events, nextBefore: body.nextBefore ?? null };
}

/**
 * Paged query options: each "older" page starts before the last event shown.
 * @param orgId the organization
 * @param action only this action; empty for all
 * @returns options keyed `['organizations', orgId, 'audit-events', action]`
 * @example useInfiniteQuery(getAuditEventsQueryOptions(orgId, ''))
 */
export function getAuditEventsQueryOptions(orgId: string, action: string) {
  return infiniteQueryOptions({
    queryKey: ['organizations', orgId, 'audit-events', action],
    queryFn: ({ pageParam }) => getAuditEvents(orgId, { before: pageParam, action }),
    initialPageParam: null as string | null,
    getNextPageParam: (lastPage) => lastPage.nextBefore,
  });
}

/**
 * The audit log in a component.
 * @param orgId the organization
 * @param action only this action; empty for all
 * @returns the infinite query result (`fetchNextPage` loads older events)
 * @example const log = useAuditEvents(orgId, '');
 */
export function useAuditEvents(orgId: string, action: string) {
  return useInfiniteQuery(getAuditEventsQueryOptions(orgId, action));
}

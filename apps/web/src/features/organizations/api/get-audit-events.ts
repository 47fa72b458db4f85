import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AuditEvent } from '../../../types/api';

export const AUDIT_PAGE_SIZE = 50;

/** Actions the server records (apps/server `AUDIT_ACTIONS`), for the filter; the server rejects any other. */
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
  'customer_file.upload',
  'customer_file.import',
  'customer_file.delete',
  'customer_file.rejected_download',
  'surface.create',
  'surface.cancel',
  'surface.retry',
  'surface.delete',
  'site.create',
  'site.update',
  'site.delete',
  'site.import',
  'export.surface_geotiff',
  'export.surface_contours',
  'scoring.settings_update',
  'scoring.run_create',
  'scoring.run_delete',
  'scoring.set_create',
  'shortlist.create',
  'shortlist.version_create',
  'shortlist.rename',
  'shortlist.delete',
  'shortlist.share',
  'export.ranking_xlsx',
  'export.ranking_csv',
  'export.sites_geojson',
  'export.shortlist_xlsx',
  'billing.checkout',
  'billing.purchase',
  'billing.seats_change',
  'invitation.create',
  'invitation.revoke',
  'invitation.resend',
  'invitation.accept',
  'member.role_change',
  'member.remove',
] as const;

/** `nextBefore` is the id of the oldest event shown (the server sends an integer). */
export type AuditEventsPage = { events: AuditEvent[]; nextBefore: string | number | null };

/**
 * One page of an organization's audit log, newest first.
 * @param orgId the organization
 * @param options `before` (an event id: return older events) and `action` (only this action)
 * @returns events and the cursor for the next older page (null at the end)
 * @example const { events, nextBefore } = await getAuditEvents(orgId, { action: 'workspace.delete' });
 */
export async function getAuditEvents(
  orgId: string,
  options: { before?: string | number | null; action?: string | null } = {},
): Promise<AuditEventsPage> {
  const body = await api.get<{ events: AuditEvent[]; nextBefore?: string | number | null }>(`/organizations/${orgId}/audit-events`, {
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
    initialPageParam: null as string | number | null,
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

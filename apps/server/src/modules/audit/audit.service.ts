import type { EntityManager } from '@mikro-orm/sqlite';
import { AuditEventSchema, type AuditAction, type AuditEvent } from './audit-event.entity.js';
import { MembershipSchema } from '../organization/membership.entity.js';
import type { User } from '../user/user.entity.js';

/** What an audit entry points at, e.g. `{ type: 'workspace', id }`. */
export interface AuditTarget {
  type: string;
  id: string;
}

/**
 * Queues an audit event in the unit of work; the caller's flush writes it with the change it records.
 * @param em - entity manager
 * @param entry - action, organization id (null for account events), actor, target and details (no secrets, no e-mails)
 * @returns the queued event
 * @example
 * auditRecord(em, { action: 'workspace.create', organizationId, actor: user, target: { type: 'workspace', id } });
 */
export function auditRecord(
  em: EntityManager,
  entry: { action: AuditAction; organizationId?: string | null; actor?: User | null; target?: AuditTarget | null; details?: Record<string, unknown> },
): AuditEvent {
  return em.create(AuditEventSchema, {
    action: entry.action,
    organization: entry.organizationId ? em.getReference('Organization', entry.organizationId) : null,
    actor: entry.actor ?? null,
    targetType: entry.target?.type ?? null,
    targetId: entry.target?.id ?? null,
    details: entry.details ?? {},
    createdAt: new Date(),
  } as AuditEvent);
}

/** One audit event as the API returns it. */
export interface AuditEventView {
  id: number;
  action: string;
  actor: { id: string; name: string; email: string } | null;
  target: AuditTarget | null;
  details: Record<string, unknown>;
  createdAt: string;
}

/**
 * An organization's audit log, newest first: its own events plus account events (sign-in, sign-out,
 * password reset) of its current members.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param query - page size, `before` (exclusive event id) and optional action filter
 * @returns the events and the `before` value for the next page (null on the last page)
 * @example
 * const { events, nextBefore } = await auditList(em, orgId, { limit: 50 });
 */
export async function auditList(
  em: EntityManager,
  organizationId: string,
  query: { limit: number; before?: number; action?: string },
): Promise<{ events: AuditEventView[]; nextBefore: number | null }> {
  const members = await em.find(MembershipSchema, { organization: organizationId }, { fields: ['user'] });
  const memberIds = members.map((m) => m.user.id);
  const rows = await em.find(
    AuditEventSchema,
    {
      $or: [{ organization: organizationId }, { organization: null, actor: { $in: memberIds } }],
      ...(query.before !== undefined ? { id: { $lt: query.before } } : {}),
      ...(query.action ? { action: query.action as AuditAction } : {}),
    },
    { orderBy: { id: 'desc' }, limit: query.limit, populate: ['actor'] },
  );
  const events = rows.map((e) => ({
    id: e.id,
    action: e.action,
    actor: e.actor ? { id: e.actor.id, name: e.actor.name, email: e.actor.email } : null,
    target: e.targetType && e.targetId ? { type: e.targetType, id: e.targetId } : null,
    details: e.details,
    createdAt: e.createdAt.toISOString(),
  }));
  return { events, nextBefore: rows.length === query.limit ? rows[rows.length - 1].id : null };
}

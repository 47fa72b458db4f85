import { EntitySchema } from '@mikro-orm/core';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';

/** Audit actions recorded so far (later features add theirs here). */
export const AUDIT_ACTIONS = [
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
  'scoring.settings_update',
  'scoring.run_create',
  'scoring.run_delete',
  'scoring.set_create',
  'export.surface_geotiff',
  'export.surface_contours',
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
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

/**
 * One recorded action. Sequential integer id gives a stable order for `before=` paging.
 * `organization` is null for account-level events (sign-in etc.); `details` never holds passwords,
 * tokens or e-mail addresses.
 */
export interface AuditEvent {
  id: number;
  organization: Organization | null;
  actor: User | null;
  action: AuditAction;
  targetType: string | null;
  targetId: string | null;
  details: Record<string, unknown>;
  createdAt: Date;
}

export const AuditEventSchema = new EntitySchema<AuditEvent>({
  name: 'AuditEvent',
  tableName: 'audit_events',
  properties: {
    id: { type: 'integer', primary: true, autoincrement: true },
    organization: { kind: 'm:1', entity: 'Organization', nullable: true, deleteRule: 'cascade' },
    actor: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
    action: { type: 'string', length: 64 },
    targetType: { type: 'string', length: 40, nullable: true },
    targetId: { type: 'string', length: 64, nullable: true },
    details: { type: 'json' },
    createdAt: { type: 'Date', onCreate: () => new Date() },
  },
});

import type { Response } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import type { AuditAction } from '../audit/audit-event.entity.js';
import type { User } from '../user/user.entity.js';

/** Content types of the report downloads. */
export const REPORT_TYPES = {
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  csv: 'text/csv; charset=utf-8',
  geojson: 'application/geo+json',
} as const;

function slug(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40)
    .replace(/-+$/g, '');
}

/**
 * A download file name "demandscape-<part>-<part>-…-<suffix>.<ext>" from names (accents dropped,
 * lower case, anything but letters and digits → "-", each part at most 40 characters, empty parts skipped).
 * @param parts - e.g. workspace and run names
 * @param suffix - e.g. 'ranking'
 * @param extension - without the dot
 * @returns a header-safe ASCII file name
 * @example
 * reportFileName(['North corridor', 'Harbour run'], 'ranking', 'csv'); // 'demandscape-north-corridor-harbour-run-ranking.csv'
 */
export function reportFileName(parts: string[], suffix: string, extension: string): string {
  return (
    [...['demandscape', ...parts].map(slug).filter(Boolean), suffix].join('-') + `.${extension}`
  );
}

/**
 * Records the download and sends the file as an attachment (not cached).
 * @param em - entity manager
 * @param res - the response
 * @param file - bytes or text, its name and kind
 * @param audit - action, organization, actor, target and details (no addresses, no customer data)
 * @returns nothing
 * @example
 * await reportSend(em, res, { body: csv, name, kind: 'csv' }, { action: 'export.ranking_csv', organizationId, actor, target });
 */
export async function reportSend(
  em: EntityManager,
  res: Response,
  file: { body: Buffer | string; name: string; kind: keyof typeof REPORT_TYPES },
  audit: {
    action: AuditAction;
    organizationId: string;
    actor: User;
    target: { type: string; id: string };
    details: Record<string, unknown>;
  },
): Promise<void> {
  auditRecord(em, audit);
  await em.flush();
  res.set({
    'Content-Type': REPORT_TYPES[file.kind],
    'Content-Disposition': `attachment; filename="${file.name}"`,
    'Cache-Control': 'no-store',
  });
  res.send(file.body);
}

import { existsSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { ConflictError, NotFoundError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';
import { CustomerFileSchema, type CustomerFile } from './customer-file.entity.js';
import {
  customerFileInspect,
  previewOf,
  previewRows,
  type CustomerFilePreview,
} from './customer-file-inspect.js';
import { customerFileView, type CustomerFileView } from './customer-file-view.js';
import { fileSniff } from './file-sniff.js';

/** Where a request points: the organization (from the membership) and the workspace (from the path). */
export interface CustomerFileScope {
  organizationId: string;
  workspaceId: string;
}

/**
 * Checks that the workspace belongs to the organization.
 * @param em - entity manager
 * @param scope - organization and workspace ids
 * @returns nothing
 * @throws NotFoundError('Workspace') otherwise
 * @example
 * await workspaceInScope(em, { organizationId, workspaceId });
 */
export async function workspaceInScope(em: EntityManager, scope: CustomerFileScope): Promise<void> {
  const count = await em.count(WorkspaceSchema, {
    id: scope.workspaceId,
    organization: scope.organizationId,
  });
  if (count === 0) throw new NotFoundError('Workspace');
}

/**
 * One customer file inside its organization and workspace (another's id is "not found").
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @returns the entity (createdBy populated)
 * @throws NotFoundError('Customer file')
 * @example
 * const file = await customerFileLoad(em, scope, id);
 */
export async function customerFileLoad(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
): Promise<CustomerFile> {
  const f = await em.findOne(
    CustomerFileSchema,
    { id: fileId, organization: scope.organizationId, workspace: scope.workspaceId },
    { populate: ['createdBy'] },
  );
  if (!f) throw new NotFoundError('Customer file');
  return f;
}

/**
 * Customer files of a workspace, newest first.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param withExamples - include report example rows (owners and analysts)
 * @returns views
 * @example
 * const files = await customerFileList(em, scope, true);
 */
export async function customerFileList(
  em: EntityManager,
  scope: CustomerFileScope,
  withExamples: boolean,
): Promise<CustomerFileView[]> {
  await workspaceInScope(em, scope);
  const rows = await em.find(
    CustomerFileSchema,
    { organization: scope.organizationId, workspace: scope.workspaceId },
    { populate: ['createdBy'], orderBy: { createdAt: 'desc', id: 'asc' } },
  );
  return rows.map((f) => customerFileView(f, withExamples));
}

/**
 * Registers a received upload: sniffs the format, detects encoding, delimiter, decimal mark and
 * columns, and returns the preview. A refused file is deleted from disk at once.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param actor - uploader
 * @param upload - multer's stored file (random name in uploadsDir), original name and size
 * @returns the new file (awaiting mapping) and its preview
 * @example
 * const { customerFile, preview } = await customerFileCreate(em, scope, user, { path, storedName, originalName, size });
 */
export async function customerFileCreate(
  em: EntityManager,
  scope: CustomerFileScope,
  actor: User,
  upload: { path: string; storedName: string; originalName: string; size: number },
): Promise<{ customerFile: CustomerFileView; preview: CustomerFilePreview }> {
  try {
    await workspaceInScope(em, scope);
    const { format } = await fileSniff(upload.path);
    const { detected, preview } = await customerFileInspect(upload.path, format);
    const f = em.create(CustomerFileSchema, {
      id: entityId(),
      organization: em.getReference('Organization', scope.organizationId),
      workspace: em.getReference('Workspace', scope.workspaceId),
      name: originalName(upload.originalName),
      sizeBytes: upload.size,
      format,
      status: 'awaiting-mapping',
      error: null,
      detected,
      mapping: null,
      weightKind: null,
      weightLabel: null,
      excludeFlagged: false,
      report: null,
      bbox: null,
      storedName: upload.storedName,
      rejectedCsv: null,
      createdBy: em.getReference('User', actor.id),
      importedAt: null,
    } as unknown as CustomerFile);
    auditRecord(em, {
      action: 'customer_file.upload',
      organizationId: scope.organizationId,
      actor,
      target: { type: 'customer_file', id: f.id },
      details: { name: f.name, sizeBytes: f.sizeBytes, format },
    });
    await em.flush();
    f.createdBy = actor;
    return { customerFile: customerFileView(f, true), preview };
  } catch (err) {
    await rm(upload.path, { force: true });
    throw err;
  }
}

function originalName(name: string): string {
  // Browsers send UTF-8 names that multer reads as latin1.
  const decoded = Buffer.from(name, 'latin1').toString('utf8');
  const clean = (decoded.includes('\uFFFD') ? name : decoded).replace(/[\\/]/g, '_').trim();
  return (clean || 'customer-file').slice(0, 255);
}

/**
 * The mapping step's preview, re-read from the raw upload.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @param uploadsDir - UPLOADS_DIR
 * @returns the preview
 * @throws ConflictError RAW_FILE_DISCARDED after a successful import (only coordinates and weight are kept)
 * @example
 * const preview = await customerFilePreview(em, scope, id, config.uploadsDir);
 */
export async function customerFilePreview(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
  uploadsDir: string,
): Promise<CustomerFilePreview> {
  const f = await customerFileLoad(em, scope, fileId);
  const path = f.storedName ? join(uploadsDir, f.storedName) : null;
  if (!path || !existsSync(path)) {
    throw new ConflictError(
      'RAW_FILE_DISCARDED',
      'The raw upload is no longer kept (after import only coordinates and the weight are stored). Upload the file again to map its columns differently.',
    );
  }
  return previewOf(f.detected, await previewRows(path, f.format, f.detected));
}

/**
 * Deletes a customer file, its points and its raw upload. Refused while it is importing or while a
 * queued or running demand surface uses it.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @param actor - who deletes
 * @param uploadsDir - UPLOADS_DIR
 * @returns nothing
 * @throws ConflictError IMPORTING / IN_USE
 * @example
 * await customerFileDelete(em, scope, id, user, config.uploadsDir);
 */
export async function customerFileDelete(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
  actor: User,
  uploadsDir: string,
): Promise<void> {
  const f = await customerFileLoad(em, scope, fileId);
  if (f.status === 'importing')
    throw new ConflictError(
      'IMPORTING',
      'This file is being imported. Wait until the import has finished, then delete it.',
    );
  const busy = await surfacesRunningCount(em, f.id);
  if (busy > 0) {
    throw new ConflictError(
      'IN_USE',
      `${busy} demand surface${busy === 1 ? ' is' : 's are'} queued or running on this file. Cancel ${busy === 1 ? 'it' : 'them'} or wait until ${busy === 1 ? 'it finishes' : 'they finish'}, then delete the file.`,
    );
  }
  const stored = f.storedName;
  auditRecord(em, {
    action: 'customer_file.delete',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'customer_file', id: f.id },
    details: { name: f.name },
  });
  em.remove(f);
  await em.flush();
  if (stored) await rm(join(uploadsDir, stored), { force: true });
}

async function surfacesRunningCount(em: EntityManager, fileId: string): Promise<number> {
  // The surfaces table belongs to the surface module and may not exist yet in this database.
  const conn = em.getConnection();
  const table = await conn.execute<{ n: number }[]>(
    "select count(*) as n from sqlite_master where type = 'table' and name = 'surfaces'",
  );
  if (!table[0] || Number(table[0].n) === 0) return 0;
  const rows = await conn.execute<{ n: number }[]>(
    "select count(*) as n from surfaces where customer_file_id = ? and status in ('queued', 'running')",
    [fileId],
  );
  return Number(rows[0]?.n ?? 0);
}

/**
 * The rejected rows as CSV: `row,reason,<lon column>,<lat column>[,<weight column>]` with the
 * mapped cells' raw text only. Recorded in the audit log.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @param actor - who downloads
 * @returns file name and CSV text
 * @throws ConflictError NOT_IMPORTED before an import has validated the rows
 * @example
 * const { name, csv } = await customerFileRejectedCsv(em, scope, id, user);
 */
export async function customerFileRejectedCsv(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
  actor: User,
): Promise<{ name: string; csv: string }> {
  const f = await customerFileLoad(em, scope, fileId);
  await em.populate(f, ['rejectedCsv']);
  if (!f.rejectedCsv)
    throw new ConflictError(
      'NOT_IMPORTED',
      'The rows have not been validated yet. Import the file (choose the columns), then download the rejected rows.',
    );
  auditRecord(em, {
    action: 'customer_file.rejected_download',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'customer_file', id: f.id },
    details: { rejectedCount: f.rejectedCount },
  });
  await em.flush();
  const base = f.name.replace(/\.[^.]*$/, '').replace(/[^\w.-]+/g, '-') || 'customer-file';
  return { name: `${base}-rejected-rows.csv`, csv: gunzipSync(f.rejectedCsv).toString('utf8') };
}

import type { RequestHandler } from 'express';
import multer from 'multer';
import type { EntityManager } from '@mikro-orm/sqlite';
import { siteCsvRead, type SiteRowError } from './site-csv.js';
import { siteAdd, siteWorkspaceCheck, type SiteScope } from './site.service.js';
import { auditRecord } from '../audit/audit.service.js';
import { AppError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';

/** Largest sites CSV accepted (5,000 rows fit easily). */
export const SITE_CSV_MAX_BYTES = 2 * 1024 * 1024;

/** 400 SITE_ROWS_INVALID: nothing was imported; `rowErrors` lists every problem (first 500). */
export class SiteRowsInvalidError extends AppError {
  readonly rowErrors: SiteRowError[];
  constructor(errors: SiteRowError[]) {
    const rows = new Set(errors.map((e) => e.row)).size;
    super(400, 'SITE_ROWS_INVALID', `${rows} ${rows === 1 ? 'row of the file has' : 'rows of the file have'} errors; nothing was imported. Fix them and upload the file again.`);
    this.rowErrors = errors.slice(0, 500);
  }

  override toBody() {
    return { ...super.toBody(), rowErrors: this.rowErrors };
  }
}

/**
 * Receives one CSV in the multipart field `file` into memory (≤ 2 MB, else 413 FILE_TOO_LARGE).
 * @returns express middleware setting `req.file`
 * @example
 * router.post('/import', requireMembership(em, PERMISSIONS['site.write']), siteCsvReceive(), handler);
 */
export function siteCsvReceive(): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: SITE_CSV_MAX_BYTES, files: 1, fields: 5 } }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        next(new AppError(413, 'FILE_TOO_LARGE', 'The sites file is larger than 2 MB; split it into files of at most 5,000 sites.', 'file'));
      } else if (err) {
        next(new AppError(400, 'VALIDATION_FAILED', `The upload could not be read (${err instanceof Error ? err.message : String(err)}); send one CSV in the field "file".`, 'file'));
      } else if (!req.file) {
        next(new AppError(400, 'VALIDATION_FAILED', 'Send the sites CSV as multipart/form-data in the field "file".', 'file'));
      } else next();
    });
  };
}

/**
 * Imports every site of a CSV or none: any bad row rejects the whole file with per-row errors.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param actor - who imports
 * @param buffer - the CSV bytes
 * @returns how many sites were added
 * @throws SiteRowsInvalidError listing `{ row, field, message }` when any row is bad
 * @example
 * const { imported } = await siteImport(em, scope, user, req.file.buffer);
 */
export async function siteImport(em: EntityManager, scope: SiteScope, actor: User, buffer: Buffer): Promise<{ imported: number }> {
  await siteWorkspaceCheck(em, scope);
  const { sites, errors } = siteCsvRead(buffer);
  if (errors.length > 0) throw new SiteRowsInvalidError(errors);
  for (const input of sites) siteAdd(em, scope, actor, input);
  auditRecord(em, { action: 'site.import', organizationId: scope.organizationId, actor, target: { type: 'workspace', id: scope.workspaceId }, details: { count: sites.length } });
  await em.flush();
  return { imported: sites.length };
}

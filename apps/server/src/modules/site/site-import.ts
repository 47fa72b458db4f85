import { randomUUID } from 'node:crypto';
import { unlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import type { RequestHandler } from 'express';
import multer from 'multer';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { AppError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';
import { SITE_MAPPING_FIELDS, SITE_REQUIRED_FIELDS, siteColumnGuess, siteMappingByOrder, type SiteColumnMapping } from './site-columns.js';
import { siteFileRead, type SiteFileTable } from './site-file-read.js';
import { siteMappingCheck, siteRowsParse, type SiteRowError } from './site-rows.js';
import type { SiteImportFields } from './site.schemas.js';
import { siteInsertMany, siteWorkspaceCheck, type SiteScope } from './site.service.js';

/** Largest sites file accepted (5,000 rows fit easily). */
export const SITE_FILE_MAX_BYTES = 2 * 1024 * 1024;

/** Data rows shown in an import preview. */
export const SITE_PREVIEW_ROWS = 5;

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

/** What the mapping step shows before an import. */
export interface SiteImportPreview {
  format: 'csv' | 'xlsx';
  columns: string[];
  /** The first data rows (≤ 5), one text per column. */
  sampleRows: string[][];
  /** Non-blank data rows. */
  rowCount: number;
  /** Guessed from the header (by column order when the file has none). */
  mapping: SiteColumnMapping;
  /** Required fields without a guessed column (kind and attractiveness can take a default instead). */
  missing: string[];
  hasHeader: boolean;
}

/**
 * Receives one CSV or XLSX in the multipart field `file` into a private temporary file (≤ 2 MB,
 * else 413 FILE_TOO_LARGE) with the text fields in `req.body`; the route removes the file.
 * @returns express middleware setting `req.file`
 * @example
 * router.post('/import', requireMembership(em, PERMISSIONS['site.write']), siteFileReceive(), handler);
 */
export function siteFileReceive(): RequestHandler {
  const upload = multer({
    storage: multer.diskStorage({ destination: tmpdir(), filename: (_req, _file, done) => done(null, `demandscape-sites-${randomUUID()}`) }),
    limits: { fileSize: SITE_FILE_MAX_BYTES, files: 1, fields: 5, fieldSize: 10_000 },
  }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        next(new AppError(413, 'FILE_TOO_LARGE', 'The sites file is larger than 2 MB; split it into files of at most 5,000 sites.', 'file'));
      } else if (err) {
        next(new AppError(400, 'VALIDATION_FAILED', `The upload could not be read (${err instanceof Error ? err.message : String(err)}); send one CSV or XLSX in the field "file".`, 'file'));
      } else if (!req.file) {
        next(new AppError(400, 'VALIDATION_FAILED', 'Send the sites file (CSV or XLSX) as multipart/form-data in the field "file".', 'file'));
      } else next();
    });
  };
}

/**
 * Runs `work` on the received file and removes the file afterwards, whatever happens.
 * @param path - `req.file.path`
 * @param work - reads the file
 * @returns what `work` returns
 * @example
 * res.json(await siteFileUse(req.file!.path, (path) => siteImportPreview(em, scope, path)));
 */
export async function siteFileUse<T>(path: string, work: (path: string) => Promise<T>): Promise<T> {
  try {
    return await work(path);
  } finally {
    await unlink(path).catch(() => undefined);
  }
}

function guessedMapping(table: SiteFileTable): SiteColumnMapping {
  return table.hasHeader ? siteColumnGuess(table.columns) : siteMappingByOrder(table.columns);
}

/**
 * Reads a sites file for the mapping step: columns, the first rows, the row count and the guessed mapping.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param path - the received file
 * @returns the preview
 * @example
 * const preview = await siteImportPreview(em, scope, req.file.path);
 */
export async function siteImportPreview(em: EntityManager, scope: SiteScope, path: string): Promise<SiteImportPreview> {
  await siteWorkspaceCheck(em, scope);
  const table = await siteFileRead(path);
  const mapping = guessedMapping(table);
  return {
    format: table.format,
    columns: table.columns,
    sampleRows: table.rows.slice(0, SITE_PREVIEW_ROWS).map((r) => table.columns.map((_, i) => r[i] ?? '')),
    rowCount: table.rows.length,
    mapping,
    missing: SITE_REQUIRED_FIELDS.filter((f) => mapping[f] === null),
    hasHeader: table.hasHeader,
  };
}

/**
 * Imports every site of a CSV or XLSX file or none: any bad row rejects the whole file with
 * per-row errors. Fields the mapping leaves out take the guessed column.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param actor - who imports
 * @param path - the received file
 * @param fields - mapping and defaults from the form
 * @returns how many sites were added and how many empty rows were skipped
 * @throws ValidationError on `mapping.<field>`, SiteRowsInvalidError listing `{ row, field, message }`
 * @example
 * const { imported } = await siteImport(em, scope, user, req.file.path, { defaultKind: 'candidate' });
 */
export async function siteImport(em: EntityManager, scope: SiteScope, actor: User, path: string, fields: SiteImportFields): Promise<{ imported: number; emptyRows: number }> {
  await siteWorkspaceCheck(em, scope);
  const table = await siteFileRead(path);
  const guessed = guessedMapping(table);
  const mapping = Object.fromEntries(SITE_MAPPING_FIELDS.map((f) => [f, fields.mapping?.[f] === undefined ? guessed[f] : fields.mapping[f]])) as SiteColumnMapping;
  const options = { mapping, defaultKind: fields.defaultKind, defaultAttractiveness: fields.defaultAttractiveness };
  siteMappingCheck(table, options);
  const { sites, errors, emptyRows } = siteRowsParse(table, options);
  if (errors.length > 0) throw new SiteRowsInvalidError(errors);
  if (sites.length === 0) throw new AppError(400, 'EMPTY_FILE', `The file has no sites${emptyRows > 0 ? ` (${emptyRows} empty rows skipped)` : ''}; put one site per row below the header.`, 'file');
  await em.transactional(async (tx) => {
    await siteInsertMany(tx, scope, actor, sites);
    auditRecord(tx, {
      action: 'site.import',
      organizationId: scope.organizationId,
      actor,
      target: { type: 'workspace', id: scope.workspaceId },
      details: { count: sites.length, format: table.format, emptyRows },
    });
  });
  return { imported: sites.length, emptyRows };
}

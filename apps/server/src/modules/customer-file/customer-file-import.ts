import { existsSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { EntityManager, MikroORM } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { ConflictError, ValidationError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';
import {
  CustomerFileSchema,
  type ColumnMapping,
  type CustomerFile,
  type WeightKind,
} from './customer-file.entity.js';
import { customerFileView, type CustomerFileView } from './customer-file-view.js';
import {
  CUSTOMER_POINT_CHUNK_SIZE,
  CustomerPointChunkSchema,
} from './customer-point-chunk.entity.js';
import { customerPointsPack } from './customer-points.js';
import { customerFileLoad, type CustomerFileScope } from './customer-file.service.js';
import { ImportAccumulator, type ImportResult } from './import-accumulator.js';
import { rowsRead } from './row-reader.js';

/** What the analyst chose on the mapping step. */
export interface ImportInput {
  mapping: ColumnMapping;
  weightKind: WeightKind;
  weightLabel?: string;
  excludeFlagged?: boolean;
}

class ImportFailure extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

/**
 * Checks the mapping against the file's columns and marks the file `importing`; the caller then
 * starts `customerFileImport` in the background.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @param actor - who imports
 * @param input - mapping, weight kind and label, excludeFlagged
 * @returns the file view (status importing)
 * @throws ValidationError naming the bad mapping field; ConflictError IMPORT_RUNNING / ALREADY_IMPORTED
 * @example
 * const view = await customerFileImportStart(em, scope, id, user, { mapping: { lon: 'lng', lat: 'lat' }, weightKind: 'count' });
 */
export async function customerFileImportStart(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
  actor: User,
  input: ImportInput,
): Promise<CustomerFileView> {
  const f = await customerFileLoad(em, scope, fileId);
  if (f.status === 'importing')
    throw new ConflictError(
      'IMPORT_RUNNING',
      'This file is already being imported. Poll GET …/customer-files/:fileId until its status is imported or failed.',
    );
  if (f.status === 'imported')
    throw new ConflictError(
      'ALREADY_IMPORTED',
      'This file is already imported and its raw upload was discarded. Upload the file again to import it with other columns.',
    );
  const columns = f.detected.columns;
  const list = columns.map((c) => `"${c}"`).join(', ');
  for (const key of ['lon', 'lat', 'weight'] as const) {
    const name = input.mapping[key];
    if (name !== undefined && !columns.includes(name))
      throw new ValidationError(
        `mapping.${key}: the file has no column "${name}"; its columns are ${list}.`,
        `mapping.${key}`,
      );
  }
  if (input.mapping.lon === input.mapping.lat)
    throw new ValidationError(
      'mapping.lat: longitude and latitude must be two different columns.',
      'mapping.lat',
    );
  if (
    input.mapping.weight !== undefined &&
    (input.mapping.weight === input.mapping.lon || input.mapping.weight === input.mapping.lat)
  ) {
    throw new ValidationError(
      'mapping.weight: the weight must be a column other than longitude and latitude (leave it out to count every customer once).',
      'mapping.weight',
    );
  }
  f.mapping = {
    lon: input.mapping.lon,
    lat: input.mapping.lat,
    ...(input.mapping.weight ? { weight: input.mapping.weight } : {}),
  };
  f.weightKind = input.weightKind;
  f.weightLabel = input.weightLabel ?? (input.mapping.weight ? input.mapping.weight : 'customers');
  f.excludeFlagged = input.excludeFlagged ?? false;
  f.status = 'importing';
  f.error = null;
  auditRecord(em, {
    action: 'customer_file.import',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'customer_file', id: f.id },
    details: { name: f.name, weightKind: f.weightKind, excludeFlagged: f.excludeFlagged },
  });
  await em.flush();
  return customerFileView(f, true);
}

/**
 * Imports a file marked `importing`: streams every row through validation, flags outliers, and in
 * one transaction writes the packed point chunks and the report; then deletes the raw upload. On
 * any failure the file becomes `failed` with a message, no chunk remains, and the raw upload is kept
 * so the analyst can map the columns again. When no row is valid the file fails with NO_VALID_ROWS
 * but keeps its report and rejected rows (usually the columns were mapped wrongly).
 * @param orm - the ORM (a fresh EntityManager is forked)
 * @param fileId - the file
 * @param uploadsDir - UPLOADS_DIR
 * @returns resolves when the file is imported or failed (never rejects)
 * @example
 * void customerFileImport(orm, fileId, config.uploadsDir);
 */
export async function customerFileImport(
  orm: MikroORM,
  fileId: string,
  uploadsDir: string,
): Promise<void> {
  const em = orm.em.fork();
  const f = await em.findOne(CustomerFileSchema, { id: fileId, status: 'importing' });
  if (!f) return;
  try {
    const path = f.storedName ? join(uploadsDir, f.storedName) : null;
    if (!path || !existsSync(path))
      throw new ImportFailure(
        'RAW_FILE_MISSING',
        'The raw upload is missing on the server. Upload the file again.',
      );
    if (!f.mapping)
      throw new ImportFailure(
        'NO_MAPPING',
        'No column mapping was chosen. Import again with a mapping.',
      );
    const acc = new ImportAccumulator(
      f.detected.columns,
      f.mapping,
      f.detected.decimalComma,
      f.detected.hasHeader,
    );
    let skipHeader = f.detected.hasHeader;
    await rowsRead(
      path,
      {
        format: f.format,
        delimiter: f.detected.delimiter,
        encoding: f.detected.encoding,
        simpleLines: f.detected.simpleLines,
      },
      (fields) => {
        if (skipHeader) skipHeader = false;
        else acc.add(fields);
      },
    );
    const result = acc.finish(f.excludeFlagged);
    if (result.acceptedCount === 0) {
      resultApply(f, result);
      f.status = 'failed';
      f.error = {
        code: 'NO_VALID_ROWS',
        message:
          result.rowCount === 0
            ? 'The file has no data rows below the header.'
            : `None of the ${result.rowCount} rows has valid coordinates${f.excludeFlagged ? ' (or all were flagged and excluded)' : ''}. Check the report and the column mapping, then import again.`,
      };
      await em.flush();
      return;
    }
    await em.transactional(async (tx) => {
      await tx.nativeDelete(CustomerPointChunkSchema, { customerFile: f.id });
      for (
        let seq = 0, start = 0;
        start < result.count;
        seq++, start += CUSTOMER_POINT_CHUNK_SIZE
      ) {
        const count = Math.min(CUSTOMER_POINT_CHUNK_SIZE, result.count - start);
        tx.create(CustomerPointChunkSchema, {
          id: entityId(),
          customerFile: f.id,
          seq,
          count,
          data: customerPointsPack(result, start, count),
          flags: Buffer.from(result.flags.subarray(start, start + count)),
        } as never);
      }
      const current = await tx.findOneOrFail(CustomerFileSchema, f.id);
      resultApply(current, result);
      current.status = 'imported';
      current.error = null;
      current.importedAt = new Date();
      current.storedName = null;
    });
    // The import is committed; a raw file that cannot be removed now is removed with the file later.
    await rm(path, { force: true }).catch(() => {});
  } catch (err) {
    const fresh = orm.em.fork();
    const current = await fresh.findOne(CustomerFileSchema, fileId);
    if (!current) return;
    current.status = 'failed';
    current.error =
      err instanceof ImportFailure
        ? { code: err.code, message: err.message }
        : {
            code: 'IMPORT_FAILED',
            message: `The file could not be read: ${(err as Error).message}. Check that it is a valid CSV or XLSX file and import again.`,
          };
    await fresh.flush().catch(() => {});
  }
}

function resultApply(f: CustomerFile, r: ImportResult): void {
  f.rowCount = r.rowCount;
  f.acceptedCount = r.acceptedCount;
  f.rejectedCount = r.rejectedCount;
  f.flaggedCount = r.flaggedCount;
  f.excludedCount = r.excludedCount;
  f.report = r.report;
  f.bbox = r.bbox;
  f.totalWeight = r.totalWeight;
  f.rejectedCsv = gzipSync(r.rejectedCsv);
}

/**
 * On start-up: files left `importing` by a stopped server become `failed` ("import interrupted");
 * their raw upload is kept so the import can simply be run again.
 * @param orm - the ORM
 * @returns how many files were marked
 * @example
 * await customerFilesInterrupted(orm);
 */
export async function customerFilesInterrupted(orm: MikroORM): Promise<number> {
  const em = orm.em.fork();
  return em.nativeUpdate(
    CustomerFileSchema,
    { status: 'importing' },
    {
      status: 'failed',
      error: {
        code: 'IMPORT_INTERRUPTED',
        message: 'Import interrupted (the server stopped) — run the import again.',
      },
    },
  );
}

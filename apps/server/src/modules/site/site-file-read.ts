import { AppError } from '../common/errors.js';
import { cellNumber } from '../customer-file/cell-number.js';
import { columnsFromFirstRow, firstLines } from '../customer-file/customer-file-inspect.js';
import { csvDialectDetect } from '../customer-file/csv-dialect.js';
import { fileSniff, textScan } from '../customer-file/file-sniff.js';
import { rowsRead } from '../customer-file/row-reader.js';
import { siteHeaderIs } from './site-columns.js';
import { xlsxExpandedSizeCheck } from './xlsx-size-guard.js';

/** Most sites one file may hold. */
export const SITE_FILE_MAX_ROWS = 5000;

/** Most columns one sites file may have (a sites table needs fewer than ten). */
export const SITE_FILE_MAX_COLUMNS = 100;

/** The table in a sites file: its columns and every non-blank data row as cell texts. */
export interface SiteFileTable {
  format: 'csv' | 'xlsx';
  /** Header names; "column N" for a file without a header (or for a blank header cell). */
  columns: string[];
  hasHeader: boolean;
  /** CSV written with decimal commas (`44,5`); always false for XLSX (cells hold numbers). */
  decimalComma: boolean;
  /** Data rows (header left out). */
  rows: string[][];
  /** Row number of `rows[0]`: 2 after a header, else 1 (blank lines are not counted, as in customer files). */
  firstRow: number;
}

const tooMany = () =>
  new AppError(400, 'TOO_MANY_ROWS', `The file has more than ${SITE_FILE_MAX_ROWS.toLocaleString('en')} sites; split it into files of at most ${SITE_FILE_MAX_ROWS.toLocaleString('en')} rows.`, 'file');

/**
 * Reads a stored sites upload (CSV in UTF-8 or Latin-1 with comma, semicolon, tab or |; or the
 * first worksheet of an XLSX workbook, formula cells as their saved values) with the customer-file
 * readers, and decides whether the first row is a header.
 * @param path - the stored upload (≤ 2 MB)
 * @returns the table
 * @throws AppError 400 EMPTY_FILE / TOO_MANY_ROWS / TOO_MANY_COLUMNS / FILE_TOO_LARGE (workbook unpacking to > 64 MB), 415 UNSUPPORTED_FILE_TYPE
 * @example
 * const { columns, rows } = await siteFileRead('/tmp/ds-sites-…');
 */
export async function siteFileRead(path: string): Promise<SiteFileTable> {
  const format = await siteFileSniff(path);
  let encoding: 'utf-8' | 'utf-8-bom' | 'latin1' = 'utf-8';
  let delimiter: string | null = null;
  let decimalComma = false;
  let simpleLines = false;
  if (format === 'xlsx') await xlsxExpandedSizeCheck(path);
  if (format === 'csv') {
    ({ encoding, simpleLines } = await textScan(path));
    ({ delimiter, decimalComma } = csvDialectDetect(await firstLines(path, encoding)));
  }
  const all: string[][] = [];
  try {
    // One row more than a header and the limit allow, to tell "at the limit" from "over it".
    await rowsRead(path, { format, delimiter, encoding, simpleLines }, (fields) => {
      all.push(fields);
      return all.length <= SITE_FILE_MAX_ROWS + 1;
    });
  } catch (err) {
    if (format === 'xlsx') throw new AppError(415, 'UNSUPPORTED_FILE_TYPE', `The file looks like a zip archive but is not a readable .xlsx workbook (${(err as Error).message}). Save it again as .xlsx or CSV.`, 'file');
    throw err;
  }
  if (all.length === 0) throw emptyFile();
  const isNumber = (t: string) => {
    const v = cellNumber(t, decimalComma);
    return v !== null && !Number.isNaN(v);
  };
  const hasHeader = siteHeaderIs(all[0], all[1], isNumber);
  const rows = hasHeader ? all.slice(1) : all;
  if (rows.length > SITE_FILE_MAX_ROWS) throw tooMany();
  const width = Math.max(all[0].length, ...rows.map((r) => r.length));
  if (width > SITE_FILE_MAX_COLUMNS) {
    throw new AppError(400, 'TOO_MANY_COLUMNS', `The file has ${width} columns; a sites file may have at most ${SITE_FILE_MAX_COLUMNS}. Keep the columns for name, location, kind, attractiveness and notes.`, 'file');
  }
  const columns = hasHeader ? columnsFromFirstRow([...all[0], ...Array<string>(width - all[0].length).fill('')]).columns : Array.from({ length: width }, (_, i) => `column ${i + 1}`);
  return { format, columns, hasHeader, decimalComma, rows, firstRow: hasHeader ? 2 : 1 };
}

function emptyFile(): AppError {
  return new AppError(400, 'EMPTY_FILE', 'The file is empty. Upload a CSV or XLSX file with one site per row (a header line naming the columns helps).', 'file');
}

async function siteFileSniff(path: string): Promise<'csv' | 'xlsx'> {
  try {
    return (await fileSniff(path)).format;
  } catch (err) {
    if (err instanceof AppError && err.code === 'EMPTY_FILE') throw emptyFile();
    if (err instanceof AppError) throw new AppError(err.status, err.code, err.message.replace('not a customer table', 'not a sites table'), 'file');
    throw err;
  }
}

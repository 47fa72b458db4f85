import { open } from 'node:fs/promises';
import { AppError } from '../common/errors.js';
import { cellNumber } from './cell-number.js';
import { columnGuess } from './column-guess.js';
import { csvDialectDetect } from './csv-dialect.js';
import type { CustomerFileDetected } from './customer-file.entity.js';
import { textDecoderLabel, textScan } from './file-sniff.js';
import { rowsRead } from './row-reader.js';

/** Rows shown on the mapping step. */
export const PREVIEW_ROWS = 20;

/** The mapping step's view of a file: its columns, the first rows and what was detected. */
export interface CustomerFilePreview {
  columns: string[];
  rows: string[][];
  detected: {
    lon?: string;
    lat?: string;
    weight?: string;
    delimiter: string | null;
    decimalComma: boolean;
    encoding: string;
    hasHeader: boolean;
  };
}

/**
 * Column names from the first row: blank names become "column N", repeated names get " (2)", " (3)"…
 * When every cell of the first row is a number the file has no header: all columns are "column N".
 * @param first - the first row's cells
 * @returns the names and whether the first row is a header
 * @example
 * columnsFromFirstRow(['lat', '', 'lat']); // { columns: ['lat', 'column 2', 'lat (2)'], hasHeader: true }
 */
export function columnsFromFirstRow(first: string[]): { columns: string[]; hasHeader: boolean } {
  const hasHeader = !first.every((c) => {
    const v = cellNumber(c, true);
    return v !== null && !Number.isNaN(v);
  });
  const used = new Map<string, number>();
  const columns = first.map((raw, i) => {
    const base = hasHeader && raw.trim() !== '' ? raw.trim() : `column ${i + 1}`;
    const seen = used.get(base) ?? 0;
    used.set(base, seen + 1);
    return seen === 0 ? base : `${base} (${seen + 1})`;
  });
  return { columns, hasHeader };
}

/**
 * Reads the start of a stored upload: encoding (whole file checked), delimiter and decimal mark
 * (CSV), the columns, a suggested mapping and the first rows.
 * @param path - the stored upload
 * @param format - from `fileSniff`
 * @returns what was detected and the preview
 * @throws AppError 400 NO_COLUMNS / 415 UNSUPPORTED_FILE_TYPE when nothing tabular can be read
 * @example
 * const { detected, preview } = await customerFileInspect(path, 'csv');
 */
export async function customerFileInspect(
  path: string,
  format: 'csv' | 'xlsx',
): Promise<{ detected: CustomerFileDetected; preview: CustomerFilePreview }> {
  let encoding: CustomerFileDetected['encoding'] = 'utf-8';
  let delimiter: string | null = null;
  let decimalComma = false;
  let simpleLines = false;
  if (format === 'csv') {
    ({ encoding, simpleLines } = await textScan(path));
    const lines = await firstLines(path, encoding);
    ({ delimiter, decimalComma } = csvDialectDetect(lines));
  }
  const rows: string[][] = [];
  try {
    await rowsRead(path, { format, delimiter, encoding, simpleLines }, (fields) => {
      rows.push(fields);
      return rows.length <= PREVIEW_ROWS;
    });
  } catch (err) {
    if (format === 'xlsx') {
      throw new AppError(
        415,
        'UNSUPPORTED_FILE_TYPE',
        `The file looks like a zip archive but is not a readable .xlsx workbook (${(err as Error).message}). Save it again as .xlsx or CSV.`,
        'file',
      );
    }
    throw err;
  }
  if (rows.length === 0)
    throw new AppError(
      400,
      'NO_COLUMNS',
      'No rows found in the file (the first worksheet is read for XLSX). Put a header line and one customer per row.',
      'file',
    );
  const { columns, hasHeader } = columnsFromFirstRow(rows[0]);
  if (columns.length < 2) {
    throw new AppError(
      400,
      'NO_COLUMNS',
      'Only one column was found. Separate columns with a comma, semicolon, tab or |, and put longitude and latitude in columns of their own.',
      'file',
    );
  }
  const suggested = columnGuess(columns);
  const detected: CustomerFileDetected = {
    columns,
    hasHeader,
    delimiter,
    decimalComma,
    encoding,
    simpleLines,
    suggested,
  };
  return {
    detected,
    preview: previewOf(
      detected,
      hasHeader ? rows.slice(1, PREVIEW_ROWS + 1) : rows.slice(0, PREVIEW_ROWS),
    ),
  };
}

/**
 * The preview shape from the stored detection and the first data rows.
 * @param detected - stored detection
 * @param rows - first data rows
 * @returns the preview
 * @example
 * previewOf(file.detected, rows);
 */
export function previewOf(detected: CustomerFileDetected, rows: string[][]): CustomerFilePreview {
  return {
    columns: detected.columns,
    rows,
    detected: {
      ...detected.suggested,
      delimiter: detected.delimiter,
      decimalComma: detected.decimalComma,
      encoding: detected.encoding,
      hasHeader: detected.hasHeader,
    },
  };
}

/**
 * The first data rows of a stored upload, for reopening the mapping step.
 * @param path - the stored upload
 * @param format - csv or xlsx
 * @param detected - stored detection
 * @returns up to PREVIEW_ROWS data rows
 * @example
 * const rows = await previewRows(path, file.format, file.detected);
 */
export async function previewRows(
  path: string,
  format: 'csv' | 'xlsx',
  detected: CustomerFileDetected,
): Promise<string[][]> {
  const rows: string[][] = [];
  const wanted = PREVIEW_ROWS + (detected.hasHeader ? 1 : 0);
  await rowsRead(
    path,
    {
      format,
      delimiter: detected.delimiter,
      encoding: detected.encoding,
      simpleLines: detected.simpleLines,
    },
    (fields) => {
      rows.push(fields);
      return rows.length < wanted;
    },
  );
  return detected.hasHeader ? rows.slice(1) : rows;
}

/**
 * The first lines of a text file (up to 64 KB; a cut-off last line is dropped), for dialect detection.
 * Shared with the sites import (`modules/site/site-file-read.ts`).
 * @param path - the file
 * @param encoding - from `textScan`
 * @returns the lines without line breaks
 * @example
 * csvDialectDetect(await firstLines(path, 'utf-8'));
 */
export async function firstLines(
  path: string,
  encoding: CustomerFileDetected['encoding'],
): Promise<string[]> {
  const handle = await open(path, 'r');
  try {
    const buf = Buffer.alloc(64 * 1024);
    const { bytesRead } = await handle.read(buf, 0, buf.length, 0);
    const text = new TextDecoder(textDecoderLabel(encoding)).decode(buf.subarray(0, bytesRead));
    const lines = text.split(/\r\n|\n|\r/);
    if (bytesRead === buf.length) lines.pop();
    return lines;
  } finally {
    await handle.close();
  }
}

import { createReadStream } from 'node:fs';
import { Transform } from 'node:stream';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { textDecoderLabel } from './file-sniff.js';

/** How to read one stored upload. */
export interface RowSourceOptions {
  format: 'csv' | 'xlsx';
  /** CSV only. */
  delimiter?: string | null;
  /** CSV only. */
  encoding?: 'utf-8' | 'utf-8-bom' | 'latin1';
  /** CSV only: the file has no quotes and `\n` line ends (`textScan`), so plain splitting is exact. */
  simpleLines?: boolean;
}

/** Called for every non-blank line (header included); return false to stop reading. */
export type RowCallback = (fields: string[]) => boolean | void;

/**
 * Streams the rows of a CSV (papaparse on a decoded Node stream, with back-pressure) or of the
 * first worksheet of an XLSX workbook (exceljs' streaming reader) as arrays of cell text.
 * Blank lines are skipped. XLSX numbers are written with JavaScript's shortest round-trip form.
 * @param path - the stored upload
 * @param options - format, CSV delimiter and encoding
 * @param onRow - receives each row's fields; returning false stops early
 * @returns resolves when the file is read (or reading stopped)
 * @throws Error with the parser's message when the file cannot be read
 * @example
 * await rowsRead(path, { format: 'csv', delimiter: ';', encoding: 'latin1' }, (fields) => { rows.push(fields); return rows.length < 21; });
 */
export async function rowsRead(
  path: string,
  options: RowSourceOptions,
  onRow: RowCallback,
): Promise<void> {
  if (options.format === 'xlsx') return xlsxRowsRead(path, onRow);
  if (options.simpleLines && options.delimiter) return linesRowsRead(path, options, onRow);
  return csvRowsRead(path, options, onRow);
}

/** True for a row whose cells are all blank (treated like an empty line). */
function blankRow(fields: string[]): boolean {
  return fields[0].trim() === '' && fields.every((f) => f.trim() === '');
}

async function linesRowsRead(
  path: string,
  options: RowSourceOptions,
  onRow: RowCallback,
): Promise<void> {
  const decoder = new TextDecoder(textDecoderLabel(options.encoding ?? 'utf-8'));
  const delimiter = options.delimiter!;
  const file = createReadStream(path, { highWaterMark: 1 << 20 });
  let rest = '';
  const emit = (line: string): boolean => {
    const fields = (line.endsWith('\r') ? line.slice(0, -1) : line).split(delimiter);
    if (blankRow(fields)) return true;
    return onRow(fields) !== false;
  };
  try {
    for await (const chunk of file as AsyncIterable<Buffer>) {
      const lines = (rest + decoder.decode(chunk, { stream: true })).split('\n');
      rest = lines.pop()!;
      for (const line of lines) if (!emit(line)) return;
    }
    const last = rest + decoder.decode();
    if (last !== '') emit(last);
  } finally {
    file.destroy();
  }
}

function csvRowsRead(path: string, options: RowSourceOptions, onRow: RowCallback): Promise<void> {
  const decoder = new TextDecoder(textDecoderLabel(options.encoding ?? 'utf-8'));
  const decode = new Transform({
    // Strings go to the parser as they are (object mode), never split inside a character.
    readableObjectMode: true,
    transform(chunk: Buffer, _enc, done) {
      const text = decoder.decode(chunk, { stream: true });
      done(null, text === '' ? undefined : text);
    },
    flush(done) {
      const text = decoder.decode();
      done(null, text === '' ? undefined : text);
    },
  });
  const file = createReadStream(path, { highWaterMark: 1 << 20 });
  return new Promise<void>((resolve, reject) => {
    let settled = false;
    const finish = (err?: Error) => {
      if (settled) return;
      settled = true;
      if (err) reject(err);
      else resolve();
    };
    file.on('error', finish);
    decode.on('error', finish);
    file.pipe(decode);
    // papaparse reads a Node readable stream chunk by chunk; each chunk's rows arrive together and
    // are handled synchronously, so at most one chunk waits in its queue.
    Papa.parse(decode as unknown as File, {
      delimiter: options.delimiter ?? '',
      header: false,
      // 'greedy' would join every row to test it; blank-looking rows are skipped below instead.
      skipEmptyLines: true,
      chunk(results: Papa.ParseResult<string[]>, parser: Papa.Parser) {
        for (const fields of results.data) {
          if (blankRow(fields)) continue;
          if (onRow(fields) === false) {
            parser.abort();
            file.destroy();
            finish();
            return;
          }
        }
      },
      complete: () => finish(),
      error: (err: Error) => finish(err),
    });
  });
}

async function xlsxRowsRead(path: string, onRow: RowCallback): Promise<void> {
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(path, {
    sharedStrings: 'cache',
    hyperlinks: 'ignore',
    styles: 'ignore',
    worksheets: 'emit',
    entries: 'emit',
  });
  for await (const sheet of reader) {
    for await (const row of sheet as AsyncIterable<ExcelJS.Row>) {
      const values = row.values as unknown[];
      const fields: string[] = [];
      for (let i = 1; i < values.length; i++) fields.push(xlsxCellText(values[i]));
      while (fields.length > 0 && fields[fields.length - 1] === '') fields.pop();
      if (fields.length === 0) continue;
      if (onRow(fields) === false) return;
    }
    // Only the first worksheet is read.
    return;
  }
}

/**
 * Text of one XLSX cell value as exceljs reports it (number, string, date, rich text, formula
 * result, hyperlink, error).
 * @param value - the cell value
 * @returns its text ('' for empty)
 * @example
 * xlsxCellText({ formula: 'A1*2', result: 8.5 }); // '8.5'
 */
export function xlsxCellText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object') {
    const v = value as {
      richText?: { text: string }[];
      result?: unknown;
      text?: unknown;
      error?: string;
      sharedString?: unknown;
    };
    if (Array.isArray(v.richText)) return v.richText.map((r) => r.text).join('');
    if ('result' in v) return xlsxCellText(v.result);
    // A formula never calculated by a spreadsheet program has no saved value: read it as empty.
    if ('formula' in v || 'sharedFormula' in v) return '';
    if (v.text !== undefined) return xlsxCellText(v.text);
    if (v.error !== undefined) return String(v.error);
  }
  return String(value);
}

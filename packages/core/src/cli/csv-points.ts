import Papa from 'papaparse';
import { CoreError } from '../errors.js';
import { csvColumns, type CsvColumnOptions, type CsvColumns } from './csv-columns.js';

/** One rejected data row: its line number in the file (header = line 1) and why. */
export interface CsvRowProblem {
  line: number;
  message: string;
}

/** Parsed customer rows: coordinates in the input's units (degrees or metres) and weights. */
export interface CsvPoints {
  a: Float64Array;
  b: Float64Array;
  w: Float64Array;
  columns: CsvColumns;
  problems: CsvRowProblem[];
}

/**
 * Splits CSV text into rows of cells. The delimiter is the most frequent of , ; tab | in the
 * header line. Without any double quote there is nothing to unescape and a plain split is several
 * times faster than the full parser on a million rows; otherwise papaparse does it (RFC 4180
 * quoting). Blank lines come back as one empty cell.
 */
function csvRows(text: string): string[][] {
  const end = text.indexOf('\n');
  const header = end < 0 ? text : text.slice(0, end);
  const delimiter = [',', ';', '\t', '|'].reduce((best, d) => (header.split(d).length > header.split(best).length ? d : best));
  if (!text.includes('"')) {
    const lines = text.split(/\r?\n/);
    if (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
    return lines.map((l) => l.split(delimiter));
  }
  return Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false }).data;
}

function numberParse(raw: string | undefined): number {
  const s = (raw ?? '').trim();
  // Number('') is 0, so an empty cell must be caught before conversion.
  return s === '' ? Number.NaN : Number(s);
}

/**
 * Parses a customer CSV (header row first). Every row is checked; bad rows are collected with
 * their line numbers instead of being dropped silently. Lon/lat must lie in [-180, 180] and
 * [-90, 90]; weights must be finite and ≥ 0.
 *
 * @param text the whole file as text
 * @param options column names and whether the coordinates are planar metres
 * @returns the accepted points and the list of problems (empty when every row is good)
 * @example
 * const { a: lon, b: lat, w, problems } = csvPoints('lon,lat\n-38.5,44.5\n', { planar: false });
 */
export function csvPoints(text: string, options: CsvColumnOptions): CsvPoints {
  const rows = csvRows(text.replace(/^\uFEFF/, ''));
  if (rows.length === 0 || rows[0].every((c) => c.trim() === '')) {
    throw new CoreError('EMPTY_POINTS', 'the CSV is empty: it needs a header row and at least one data row', 'input');
  }
  const columns = csvColumns(rows[0], options);
  const a = new Float64Array(rows.length);
  const b = new Float64Array(rows.length);
  const w = new Float64Array(rows.length);
  const problems: CsvRowProblem[] = [];
  const [aName, bName] = [columns.names.a, columns.names.b];
  let n = 0;
  for (let r = 1; r < rows.length; r++) {
    const row = rows[r];
    if (row.length === 1 && row[0].trim() === '') continue;
    const line = r + 1;
    const va = numberParse(row[columns.a]);
    const vb = numberParse(row[columns.b]);
    const vw = columns.w >= 0 ? numberParse(row[columns.w]) : 1;
    const bad: string[] = [];
    if (!Number.isFinite(va)) bad.push(`${aName} "${row[columns.a] ?? ''}" is not a number`);
    else if (!options.planar && Math.abs(va) > 180) bad.push(`${aName} ${va} is outside [-180, 180]`);
    if (!Number.isFinite(vb)) bad.push(`${bName} "${row[columns.b] ?? ''}" is not a number`);
    else if (!options.planar && Math.abs(vb) > 90) bad.push(`${bName} ${vb} is outside [-90, 90]`);
    if (!Number.isFinite(vw)) bad.push(`${columns.names.w} "${row[columns.w] ?? ''}" is not a number`);
    else if (vw < 0) bad.push(`${columns.names.w} ${vw} is negative`);
    if (bad.length > 0) {
      problems.push({ line, message: bad.join('; ') });
      continue;
    }
    a[n] = va;
    b[n] = vb;
    w[n] = vw;
    n++;
  }
  return { a: a.slice(0, n), b: b.slice(0, n), w: w.slice(0, n), columns, problems };
}

/**
 * Formats row problems for a terminal: the first `limit` listed, then how many more.
 *
 * @param problems rejected rows
 * @param file file name for the message
 * @param limit how many rows to list (default 20)
 * @returns a multi-line message
 * @example
 * csvProblemsFormat([{ line: 3, message: 'lat 95 is outside [-90, 90]' }], 'customers.csv');
 */
export function csvProblemsFormat(problems: CsvRowProblem[], file: string, limit = 20): string {
  const lines = problems.slice(0, limit).map((p) => `  line ${p.line}: ${p.message}`);
  if (problems.length > limit) lines.push(`  … and ${problems.length - limit} more bad rows`);
  return (
    `${file}: ${problems.length} bad row${problems.length === 1 ? '' : 's'} (nothing was computed; fix or remove them):\n` +
    lines.join('\n')
  );
}

/** Delimiters tried, in order of preference when two fit equally well. */
export const CSV_DELIMITERS = ['\t', ';', '|', ','] as const;

/** How a delimited text file is written. */
export interface CsvDialect {
  delimiter: string;
  /** Numbers are written with a decimal comma (`12,5`). */
  decimalComma: boolean;
}

const QUOTED = /"(?:[^"]|"")*"/g;
const DECIMAL_COMMA = /^[+-]?\d+,\d+$/;
const DECIMAL_POINT = /^[+-]?\d+\.\d+$/;

/**
 * Detects the delimiter and the decimal mark from the first lines of a text file.
 * Delimiter: the candidate that appears the same, non-zero number of times on the most lines
 * (quoted text ignored), counting the header too; ties go to tab, then `;`, `|`, `,`.
 * Decimal comma: only for a non-comma delimiter, when more fields look like `12,5` than `12.5`.
 * @param lines - the first lines (header first), without line breaks
 * @returns the dialect
 * @example
 * csvDialectDetect(['breite;länge;umsatz', '53,1;8,4;120,5']); // { delimiter: ';', decimalComma: true }
 */
export function csvDialectDetect(lines: string[]): CsvDialect {
  const sample = lines.filter((l) => l.trim() !== '').slice(0, 50);
  let best: { delimiter: string; score: number; fields: number } = {
    delimiter: ',',
    score: -1,
    fields: 0,
  };
  for (const d of CSV_DELIMITERS) {
    const counts = sample.map((l) => l.replace(QUOTED, '').split(d).length - 1);
    const modal = counts.length > 0 ? mode(counts) : 0;
    if (modal === 0) continue;
    const score = counts.filter((c) => c === modal).length / counts.length;
    if (score > best.score + 1e-9) best = { delimiter: d, score, fields: modal + 1 };
  }
  const delimiter = best.delimiter;
  let comma = 0;
  let point = 0;
  if (delimiter !== ',') {
    for (const line of sample.slice(1)) {
      for (const raw of line.split(delimiter)) {
        const f = raw.trim().replace(/^"|"$/g, '');
        if (DECIMAL_COMMA.test(f)) comma++;
        else if (DECIMAL_POINT.test(f)) point++;
      }
    }
  }
  return { delimiter, decimalComma: comma > point };
}

function mode(values: number[]): number {
  const tally = new Map<number, number>();
  for (const v of values) tally.set(v, (tally.get(v) ?? 0) + 1);
  let best = 0;
  let bestCount = 0;
  for (const [v, c] of tally)
    if (c > bestCount || (c === bestCount && v > best)) [best, bestCount] = [v, c];
  return best;
}

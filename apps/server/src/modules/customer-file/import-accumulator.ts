import type { ColumnMapping, CustomerFileReport } from './customer-file.entity.js';
import { POINT_FLAG_DUPLICATE, POINT_FLAG_OUTLIER } from './customer-point-chunk.entity.js';
import { outlierFlag } from './outlier-flag.js';
import { rowValidate, type FlagReason, type RejectReason } from './row-validate.js';
import { csvCell } from './csv-cell.js';
import { RowHashSet } from './row-hash-set.js';

/** Example rows kept per reason in the report. */
export const REPORT_EXAMPLES_PER_REASON = 5;

/** Everything an import produced, ready to store. */
export interface ImportResult {
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
  flags: Uint8Array;
  /** Stored points. */
  count: number;
  rowCount: number;
  acceptedCount: number;
  rejectedCount: number;
  flaggedCount: number;
  excludedCount: number;
  report: CustomerFileReport;
  bbox: [number, number, number, number] | null;
  totalWeight: number;
  rejectedCsv: string;
}

/**
 * Validates rows one by one and collects accepted points in growing typed arrays, the counts per
 * reason, a few examples and the rejected-rows CSV (row number, reason and the mapped cells' raw
 * text only — no other column is ever kept). `finish` flags outliers and applies `excludeFlagged`.
 * Row numbers count the header as row 1, as a spreadsheet shows them (blank lines are not counted).
 */
export class ImportAccumulator {
  private lon = new Float64Array(1 << 16);
  private lat = new Float64Array(1 << 16);
  private w = new Float64Array(1 << 16);
  private flags = new Uint8Array(1 << 16);
  private rows = new Uint32Array(1 << 16);
  private n = 0;
  private rowNumber: number;
  private readonly seen = new RowHashSet();
  private readonly rejected: Record<string, number> = {};
  private readonly examples: CustomerFileReport['examples'] = {};
  private readonly rejectedLines: string[];
  private readonly lonIndex: number;
  private readonly latIndex: number;
  private readonly weightIndex: number;

  /**
   * @param columns - the file's column names
   * @param mapping - mapped column names (validated to exist)
   * @param decimalComma - numbers use a decimal comma
   * @param hasHeader - the first row was a header (row numbers start at 2 then)
   */
  constructor(
    columns: string[],
    private readonly mapping: ColumnMapping,
    private readonly decimalComma: boolean,
    hasHeader: boolean,
  ) {
    this.lonIndex = columns.indexOf(mapping.lon);
    this.latIndex = columns.indexOf(mapping.lat);
    this.weightIndex = mapping.weight ? columns.indexOf(mapping.weight) : -1;
    this.rowNumber = hasHeader ? 1 : 0;
    const header = [
      'row',
      'reason',
      mapping.lon,
      mapping.lat,
      ...(mapping.weight ? [mapping.weight] : []),
    ];
    this.rejectedLines = [header.map(csvCell).join(',')];
  }

  /**
   * Validates one data row.
   * @param fields - the row's cells
   * @returns nothing
   */
  add(fields: string[]): void {
    const row = ++this.rowNumber;
    const lonText = fields[this.lonIndex];
    const latText = fields[this.latIndex];
    const weightText = this.weightIndex >= 0 ? fields[this.weightIndex] : undefined;
    const outcome = rowValidate(
      lonText,
      latText,
      weightText,
      this.decimalComma,
      this.weightIndex >= 0,
    );
    if (!outcome.ok) {
      this.rejected[outcome.reason] = (this.rejected[outcome.reason] ?? 0) + 1;
      this.example(outcome.reason, row, lonText, latText, weightText);
      const cells = [
        String(row),
        outcome.reason,
        lonText ?? '',
        latText ?? '',
        ...(this.weightIndex >= 0 ? [weightText ?? ''] : []),
      ];
      this.rejectedLines.push(cells.map(csvCell).join(','));
      return;
    }
    if (this.n === this.lon.length) this.grow();
    const i = this.n++;
    this.lon[i] = outcome.lon;
    this.lat[i] = outcome.lat;
    this.w[i] = outcome.w;
    this.rows[i] = row;
    rowHash(fields, HASH);
    if (this.seen.add(HASH[0], HASH[1])) this.flags[i] = 0;
    else {
      this.flags[i] = POINT_FLAG_DUPLICATE;
      this.example('duplicate-row', row, lonText, latText, weightText);
    }
  }

  /**
   * Flags outliers, drops flagged points when asked, and returns the arrays, counts and report.
   * @param excludeFlagged - leave flagged points (duplicates, outliers) out of the stored points
   * @returns the import result
   */
  finish(excludeFlagged: boolean): ImportResult {
    const n = this.n;
    const rule = outlierFlag(this.lon, this.lat, this.w, n);
    const flagged: Record<string, number> = {};
    let flaggedCount = 0;
    for (let i = 0; i < n; i++) {
      if (rule.outlier[i]) {
        this.flags[i] |= POINT_FLAG_OUTLIER;
        flagged.outlier = (flagged.outlier ?? 0) + 1;
        if ((this.examples.outlier?.length ?? 0) < REPORT_EXAMPLES_PER_REASON) {
          this.example(
            'outlier',
            this.rows[i],
            String(this.lon[i]),
            String(this.lat[i]),
            this.weightIndex >= 0 ? String(this.w[i]) : undefined,
          );
        }
      }
      if (this.flags[i] & POINT_FLAG_DUPLICATE)
        flagged['duplicate-row'] = (flagged['duplicate-row'] ?? 0) + 1;
      if (this.flags[i] !== 0) flaggedCount++;
    }
    let kept = 0;
    for (let i = 0; i < n; i++) {
      if (excludeFlagged && this.flags[i] !== 0) continue;
      this.lon[kept] = this.lon[i];
      this.lat[kept] = this.lat[i];
      this.w[kept] = this.w[i];
      this.flags[kept] = this.flags[i];
      kept++;
    }
    let bbox: [number, number, number, number] | null = null;
    let totalWeight = 0;
    for (let i = 0; i < kept; i++) {
      totalWeight += this.w[i];
      if (!bbox) bbox = [this.lon[i], this.lat[i], this.lon[i], this.lat[i]];
      else {
        if (this.lon[i] < bbox[0]) bbox[0] = this.lon[i];
        if (this.lat[i] < bbox[1]) bbox[1] = this.lat[i];
        if (this.lon[i] > bbox[2]) bbox[2] = this.lon[i];
        if (this.lat[i] > bbox[3]) bbox[3] = this.lat[i];
      }
    }
    const rejectedCount = this.rejectedLines.length - 1;
    const excludedCount = excludeFlagged ? flaggedCount : 0;
    return {
      lon: this.lon.subarray(0, kept),
      lat: this.lat.subarray(0, kept),
      w: this.w.subarray(0, kept),
      flags: this.flags.subarray(0, kept),
      count: kept,
      rowCount: rejectedCount + n,
      acceptedCount: kept,
      rejectedCount,
      flaggedCount,
      excludedCount,
      report: {
        rejected: this.rejected,
        flagged,
        examples: this.examples,
        outlierRule: {
          centerLon: rule.centerLon,
          centerLat: rule.centerLat,
          spreadM: rule.spreadM,
          limitM: rule.limitM,
          applied: rule.applied,
          note: rule.applied
            ? 'Flagged as outlier: farther from the weighted median centre than max(5 × the median distance of all accepted points from that centre, 1 km).'
            : 'Outliers are flagged only when at least 20 rows are accepted.',
        },
      },
      bbox,
      totalWeight,
      rejectedCsv: this.rejectedLines.join('\r\n') + '\r\n',
    };
  }

  private example(
    reason: RejectReason | FlagReason,
    row: number,
    lon: string | undefined,
    lat: string | undefined,
    weight: string | undefined,
  ): void {
    const list = (this.examples[reason] ??= []);
    if (list.length >= REPORT_EXAMPLES_PER_REASON) return;
    list.push({
      row,
      lon: lon ?? '',
      lat: lat ?? '',
      ...(this.mapping.weight ? { weight: weight ?? '' } : {}),
    });
  }

  private grow(): void {
    const size = this.lon.length * 2;
    const growF = (a: Float64Array) => {
      const b = new Float64Array(size);
      b.set(a);
      return b;
    };
    this.lon = growF(this.lon);
    this.lat = growF(this.lat);
    this.w = growF(this.w);
    const flags = new Uint8Array(size);
    flags.set(this.flags);
    this.flags = flags;
    const rows = new Uint32Array(size);
    rows.set(this.rows);
    this.rows = rows;
  }
}

const HASH = new Uint32Array(2);

/**
 * A 64-bit fingerprint of a whole row (two 32-bit FNV-1a-style hashes with different multipliers),
 * to spot exact duplicates without keeping the rows. For 10⁶ distinct rows a false match has
 * probability ≈ n²/2⁶⁵ ≈ 3·10⁻⁸ [D]; a false match would only flag a row, never drop it unless the
 * analyst excludes flagged rows.
 * @param fields - the row's cells
 * @param out - receives the two halves
 * @returns `out`
 * @example
 * rowHash(['a', '1'], new Uint32Array(2));
 */
export function rowHash(fields: string[], out: Uint32Array = new Uint32Array(2)): Uint32Array {
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let f = 0; f < fields.length; f++) {
    const s = fields[f];
    for (let i = 0; i < s.length; i++) {
      const c = s.charCodeAt(i);
      h1 = Math.imul(h1 ^ c, 0x01000193);
      h2 = Math.imul(h2 ^ c, 0x5bd1e995);
      h2 ^= h2 >>> 15;
    }
    // A separator value no character code takes, so ['ab','c'] and ['a','bc'] differ.
    h1 = Math.imul(h1 ^ 0x10000, 0x01000193);
    h2 = Math.imul(h2 ^ 0x10000, 0x5bd1e995);
  }
  out[0] = h1;
  out[1] = h2;
  return out;
}

import { cellNumber } from './cell-number.js';

/** Why a row is rejected (codes used in the report and in rejected.csv). */
export const REJECT_REASONS = [
  'missing-coordinate',
  'non-numeric-coordinate',
  'null-island',
  'likely-swapped',
  'latitude-out-of-range',
  'longitude-out-of-range',
  'non-numeric-weight',
  'negative-weight',
] as const;
export type RejectReason = (typeof REJECT_REASONS)[number];

/** Why an accepted row is flagged (kept unless the import excludes flagged rows). */
export const FLAG_REASONS = ['duplicate-row', 'outlier'] as const;
export type FlagReason = (typeof FLAG_REASONS)[number];

/** One row's outcome: the point, or the first reason it fails (checks run in REJECT_REASONS order). */
export type RowOutcome =
  { ok: true; lon: number; lat: number; w: number } | { ok: false; reason: RejectReason };

/**
 * Validates one row's mapped cells. Order of checks: a coordinate cell empty → missing-coordinate;
 * not a number → non-numeric-coordinate; exactly (0, 0) → null-island; |lat| > 90 while |lon| ≤ 90 →
 * likely-swapped; |lat| > 90 → latitude-out-of-range; |lon| > 180 → longitude-out-of-range; weight
 * (when mapped) empty or not a number → non-numeric-weight; below zero → negative-weight. Without a
 * weight column every row weighs 1. A zero weight is accepted.
 * @param lonText - raw longitude cell
 * @param latText - raw latitude cell
 * @param weightText - raw weight cell, or undefined when no weight column is mapped
 * @param decimalComma - the file writes decimals with a comma
 * @param weightMapped - a weight column is mapped
 * @returns the point or the reason
 * @example
 * rowValidate('8.41', '53.12', '120', false, true); // { ok: true, lon: 8.41, lat: 53.12, w: 120 }
 */
export function rowValidate(
  lonText: string | undefined,
  latText: string | undefined,
  weightText: string | undefined,
  decimalComma: boolean,
  weightMapped: boolean,
): RowOutcome {
  const lon = cellNumber(lonText, decimalComma);
  const lat = cellNumber(latText, decimalComma);
  if (lon === null || lat === null) return { ok: false, reason: 'missing-coordinate' };
  if (Number.isNaN(lon) || Number.isNaN(lat))
    return { ok: false, reason: 'non-numeric-coordinate' };
  if (lon === 0 && lat === 0) return { ok: false, reason: 'null-island' };
  if (Math.abs(lat) > 90 && Math.abs(lon) <= 90) return { ok: false, reason: 'likely-swapped' };
  if (Math.abs(lat) > 90) return { ok: false, reason: 'latitude-out-of-range' };
  if (Math.abs(lon) > 180) return { ok: false, reason: 'longitude-out-of-range' };
  let w = 1;
  if (weightMapped) {
    const parsed = cellNumber(weightText, decimalComma);
    if (parsed === null || Number.isNaN(parsed)) return { ok: false, reason: 'non-numeric-weight' };
    if (parsed < 0) return { ok: false, reason: 'negative-weight' };
    w = parsed;
  }
  return { ok: true, lon, lat, w };
}

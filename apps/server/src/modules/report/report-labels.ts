import type { ScoringMeasure, ScoringSettingsJson } from '../scoring/scoring.types.js';

type Settings = Pick<ScoringSettingsJson, 'radii' | 'radiusUnit'> & { radiiM: number[] };

/**
 * A ring's radius as the planner entered it, e.g. "1 km" or "0.5 mi"; from metres when the
 * settings do not list that ring.
 * @param settings - the run's settings (radii in their unit and in metres)
 * @param index - 0-based ring index
 * @param radiusM - the ring's radius in metres (fallback)
 * @returns the label
 * @example
 * ringLabel({ radii: [1, 3], radiusUnit: 'km', radiiM: [1000, 3000] }, 1, 3000); // '3 km'
 */
export function ringLabel(settings: Settings, index: number, radiusM: number): string {
  const r = settings.radii[index];
  if (r !== undefined && Math.abs((settings.radiiM[index] ?? radiusM) - radiusM) < 1e-6)
    return `${r} ${settings.radiusUnit}`;
  return `${Number((radiusM / 1000).toFixed(3))} km`;
}

/**
 * Plain words for a ranking measure.
 * @param measure - the run's measure
 * @param settings - radii for ring measures
 * @returns e.g. 'net new demand' or 'demand within 3 km'
 * @example
 * measureLabel('netNew', settings); // 'net new demand'
 */
export function measureLabel(measure: ScoringMeasure, settings: Settings): string {
  if (measure === 'netNew') return 'net new demand';
  if (measure === 'captured') return 'captured demand';
  if (measure === 'shareOfTotal') return 'share of total demand';
  if (measure === 'cannibalization') return 'cannibalization (lowest first)';
  const k = Number(measure.slice('ring:'.length));
  return `demand within ${ringLabel(settings, k, settings.radiiM[k] ?? Number.NaN)}`;
}

/**
 * A number with thousands separators and at most `digits` decimals (report text, not cells).
 * @param x - the number
 * @param digits - maximum decimals (default 0)
 * @returns e.g. '12,400'
 * @example
 * numberText(1234.5); // '1,235'
 */
export function numberText(x: number, digits = 0): string {
  if (!Number.isFinite(x)) return '–';
  return x.toLocaleString('en-US', { maximumFractionDigits: digits, minimumFractionDigits: 0 });
}

const METRES_PER_MILE = 1609.344; // international mile (NIST SP 811, B.8)

/**
 * A demand figure with three significant figures and "en" grouping (columns line up in tabular figures).
 * @param value demand in the surface's weight unit
 * @returns e.g. "12,400", "312", "0.842"
 * @example demandText(12_391.2) // '12,400'
 */
export function demandText(value: number): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  return new Intl.NumberFormat('en', { maximumSignificantDigits: 3, minimumSignificantDigits: Math.abs(value) < 1000 ? 3 : 1 }).format(value);
}

/**
 * A share of the surface's total demand as a percentage with one decimal.
 * @param fraction 0–1
 * @returns e.g. "12.3 %"
 * @example shareText(0.1234) // '12.3 %'
 */
export function shareText(fraction: number): string {
  if (!Number.isFinite(fraction)) return '–';
  return `${new Intl.NumberFormat('en', { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(fraction * 100)} %`;
}

/**
 * A ring's radius in the unit the planner chose for the run.
 * @param radiusM radius in metres
 * @param unit km or mi
 * @returns e.g. "1 km", "0.5 mi"
 * @example ringRadiusText(1609.344, 'mi') // '1 mi'
 */
export function ringRadiusText(radiusM: number, unit: 'km' | 'mi'): string {
  const value = unit === 'mi' ? radiusM / METRES_PER_MILE : radiusM / 1000;
  return `${new Intl.NumberFormat('en', { maximumFractionDigits: 2 }).format(value)} ${unit}`;
}

/**
 * A site's rank range over the bandwidth variants, in words.
 * @param stability the site's rank range, or null when rank stability was not checked for the run
 * @returns e.g. "ranks 2–5", "rank 1 throughout", "not checked"
 * @example stabilityText({ minRank: 2, maxRank: 5, unstable: true }) // 'ranks 2–5'
 */
export function stabilityText(stability: { minRank: number; maxRank: number } | null): string {
  if (!stability) return 'not checked';
  if (stability.minRank === stability.maxRank) return `rank ${stability.minRank} throughout`;
  return `ranks ${stability.minRank}–${stability.maxRank}`;
}

/**
 * Formats a number for messages and UI explanations with thousands separators and at most
 * `digits` decimals, independent of the host locale ("9,000,000", "0.215").
 *
 * @param v the number
 * @param digits maximum number of decimals (trailing zeros dropped)
 * @returns the formatted string
 * @example
 * formatNumber(9000000); // "9,000,000"
 * formatNumber(0.2154, 3); // "0.215"
 */
export function formatNumber(v: number, digits = 0): string {
  if (!Number.isFinite(v)) return String(v);
  const fixed = Math.abs(v).toFixed(digits);
  const [int, frac = ''] = fixed.split('.');
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const f = frac.replace(/0+$/, '');
  const sign = v < 0 && Number(fixed) !== 0 ? '-' : '';
  return sign + grouped + (f ? '.' + f : '');
}

/**
 * Formats a length in metres: metres below 10 km ("750 m"), km above ("12.5 km").
 *
 * @param m metres
 * @returns the formatted length with its unit
 * @example
 * formatMetres(2500); // "2,500 m"
 * formatMetres(12_500); // "12.5 km"
 */
export function formatMetres(m: number): string {
  if (Math.abs(m) >= 10_000) return `${formatNumber(m / 1000, 1)} km`;
  return `${formatNumber(m, m < 10 ? 2 : 0)} m`;
}

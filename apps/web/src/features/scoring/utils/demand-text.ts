/**
 * A demand figure with about three significant figures and thousands separators.
 * @param value the number
 * @returns the text, e.g. "1,250", "12.4", "0.0312"
 * @example demandText(1249.6) // '1,250'
 */
export function demandText(value: number): string {
  if (!Number.isFinite(value)) return '–';
  const abs = Math.abs(value);
  if (abs >= 1000) return Math.round(value).toLocaleString('en');
  if (abs === 0) return '0';
  return value.toLocaleString('en', { maximumSignificantDigits: 3 });
}

/**
 * A share (0–1) as a percentage with one decimal.
 * @param share the share
 * @returns e.g. "12.5 %"
 * @example percentText(0.125) // '12.5 %'
 */
export function percentText(share: number): string {
  if (!Number.isFinite(share)) return '–';
  return `${(share * 100).toLocaleString('en', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} %`;
}

/** Kilometres in one international mile (1 mi = 1,609.344 m exactly, NIST). */
export const KM_PER_MILE = 1.609344;

/** Unit words for ring radii. */
export const radiusUnitLabels = { km: 'km', mi: 'mi' } as const;

/**
 * A radius in metres shown in the chosen unit, e.g. "1 km", "0.5 mi", "1.2 km".
 * @param metres the radius in metres
 * @param unit km or mi
 * @returns the text with its unit
 * @example radiusText(1609.344, 'mi') // '1 mi'
 */
export function radiusText(metres: number, unit: 'km' | 'mi'): string {
  const value = unit === 'mi' ? metres / 1000 / KM_PER_MILE : metres / 1000;
  return `${value.toLocaleString('en', { maximumFractionDigits: 2 })} ${radiusUnitLabels[unit]}`;
}

/**
 * Converts ring radii typed in one unit into the other, rounded to 0.01, so a toggle keeps the rings' size.
 * @param values the radii as typed
 * @param from the unit they are in
 * @param to the unit wanted
 * @returns the converted texts (a text that is not a number stays as typed)
 * @example radiiConverted(['1', '3'], 'km', 'mi') // ['0.62', '1.86']
 */
export function radiiConverted(values: string[], from: 'km' | 'mi', to: 'km' | 'mi'): string[] {
  if (from === to) return values;
  return values.map((text) => {
    const n = Number(text.trim().replace(',', '.'));
    if (text.trim() === '' || !Number.isFinite(n)) return text;
    const km = from === 'mi' ? n * KM_PER_MILE : n;
    const out = to === 'mi' ? km / KM_PER_MILE : km;
    return String(Math.round(out * 100) / 100);
  });
}

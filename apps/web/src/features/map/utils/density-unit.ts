/** What the customer file's weight counts (contract: `weightKind`). */
export type WeightKind = 'count' | 'spend' | 'visits' | 'other';

/** The area unit a surface is expressed in. */
export type AreaUnit = 'km2' | 'sqmi';

/** Square kilometres in one square mile: 1 mi = 1.609344 km exactly (NIST SP 811, B.8), squared. */
export const KM2_PER_SQMI = 2.589988110336;

/** Written form of each area unit. */
export const areaUnitText: Record<AreaUnit, string> = { km2: 'km²', sqmi: 'sq mi' };

const weightWords: Record<WeightKind, string> = { count: 'customers', spend: 'spend', visits: 'visits', other: 'weight' };

/**
 * The legend's unit, in words: what is counted, per area unit.
 * @param weightKind what the weight column holds; `count` means every customer counts once
 * @param unit km² or sq mi
 * @param weightLabel the analyst's label for the weight (e.g. "annual spend (€)"), used instead of the generic word
 * @returns e.g. "customers per km²", "annual spend (€) per sq mi"
 * @example densityUnitLabel('spend', 'km2') // 'spend per km²'
 */
export function densityUnitLabel(weightKind: WeightKind, unit: AreaUnit, weightLabel?: string | null): string {
  const what = weightKind !== 'count' && weightLabel?.trim() ? weightLabel.trim() : weightWords[weightKind];
  return `${what} per ${areaUnitText[unit]}`;
}

/**
 * An area from the API (always km²) in the surface's unit, for contour labels.
 * @param areaKm2 area in km²
 * @param unit the unit to show
 * @returns e.g. "12.4 km²" or "4.79 sq mi"
 * @example areaText(2.589988110336, 'sqmi') // '1.00 sq mi'
 */
export function areaText(areaKm2: number, unit: AreaUnit): string {
  const value = unit === 'km2' ? areaKm2 : areaKm2 / KM2_PER_SQMI;
  return `${valueText(value)} ${areaUnitText[unit]}`;
}

/**
 * A measured value with three significant figures and thousands separators (fixed "en" grouping so
 * columns line up in tabular figures whatever the browser's language).
 * @param value the number
 * @returns e.g. "1,240", "12.4", "0.0312"
 * @example valueText(1238.6) // '1,240'
 */
export function valueText(value: number): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  return new Intl.NumberFormat('en', { maximumSignificantDigits: 3, minimumSignificantDigits: Math.abs(value) < 1000 ? 3 : 1 }).format(value);
}

/**
 * A legend tick: the round number as it is, with thousands separators and no padding zeros.
 * @param value the tick
 * @returns e.g. "2,000", "0.05"
 * @example tickText(2000) // '2,000'
 */
export function tickText(value: number): string {
  return new Intl.NumberFormat('en', { maximumSignificantDigits: 6 }).format(value);
}

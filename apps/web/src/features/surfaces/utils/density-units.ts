import type { DensityUnit } from '../types';

/** Square kilometres in one square mile: (1.609344 km)², exact since 1 mi = 1.609344 km (NIST). */
export const KM2_PER_SQMI = 2.589988110336;

/**
 * A density given per km² in the chosen unit.
 * @param perKm2 value per km²
 * @param unit the output unit
 * @returns the value per km² or per sq mi
 * @example densityIn(100, 'sqmi') // 258.9988110336
 */
export function densityIn(perKm2: number, unit: DensityUnit): number {
  return unit === 'sqmi' ? perKm2 * KM2_PER_SQMI : perKm2;
}

/**
 * An area given in km² in the unit that matches the density unit.
 * @param km2 area in km²
 * @param unit km2 or sqmi
 * @returns the area in km² or sq mi
 * @example areaIn(KM2_PER_SQMI, 'sqmi') // 1
 */
export function areaIn(km2: number, unit: DensityUnit): number {
  return unit === 'sqmi' ? km2 / KM2_PER_SQMI : km2;
}

/** Unit words for labels. */
export const unitLabels: Record<DensityUnit, { density: string; area: string }> = {
  km2: { density: 'per km²', area: 'km²' },
  sqmi: { density: 'per sq mi', area: 'sq mi' },
};

/**
 * A measurement with about three significant figures and thousands separators.
 * @param value the number
 * @returns the text, e.g. "1,250", "12.4", "0.0312"
 * @example numberText(1249.6) // '1,250'
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return '–';
  const abs = Math.abs(value);
  const digits = abs >= 100 ? 0 : abs >= 10 ? 1 : abs >= 1 ? 2 : 3;
  return value.toLocaleString('en', { maximumFractionDigits: digits, minimumFractionDigits: 0, maximumSignificantDigits: abs >= 1000 ? undefined : 3 });
}

/**
 * Metres as text, switching to km from 10 km.
 * @param m metres
 * @returns e.g. "850 m", "12.5 km"
 * @example metresText(12_500) // '12.5 km'
 */
export function metresText(m: number): string {
  return m >= 10_000 ? `${numberText(m / 1000)} km` : `${Math.round(m).toLocaleString('en')} m`;
}

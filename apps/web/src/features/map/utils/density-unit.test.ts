import { describe, expect, it } from 'vitest';
import { areaText, densityUnitLabel, KM2_PER_SQMI, tickText, valueText } from './density-unit';

describe('densityUnitLabel', () => {
  it('names what is counted and the area unit', () => {
    expect(densityUnitLabel('count', 'km2')).toBe('customers per km²');
    expect(densityUnitLabel('spend', 'sqmi')).toBe('spend per sq mi');
    expect(densityUnitLabel('visits', 'km2')).toBe('visits per km²');
    expect(densityUnitLabel('spend', 'km2', 'annual spend (€)')).toBe('annual spend (€) per km²');
    expect(densityUnitLabel('count', 'km2', 'ignored for counts')).toBe('customers per km²');
  });
});

describe('areaText', () => {
  it('converts km² to sq mi with the exact mile', () => {
    // [S] NIST SP 811 B.8: 1 mi = 1.609344 km exactly, so 1 sq mi = 2.589988110336 km².
    expect(KM2_PER_SQMI).toBeCloseTo(1.609344 ** 2, 15);
    expect(areaText(KM2_PER_SQMI, 'sqmi')).toBe('1.00 sq mi');
    expect(areaText(12.4, 'km2')).toBe('12.4 km²');
  });
});

describe('valueText and tickText', () => {
  it('shows three significant figures with separators', () => {
    expect(valueText(1238.6)).toBe('1,240');
    expect(valueText(0.031234)).toBe('0.0312');
    expect(valueText(0)).toBe('0');
    expect(valueText(Number.NaN)).toBe('–');
    expect(tickText(2000)).toBe('2,000');
    expect(tickText(0.05)).toBe('0.05');
  });
});

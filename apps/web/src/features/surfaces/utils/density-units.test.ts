import { describe, expect, it } from 'vitest';
import { areaIn, densityIn, KM2_PER_SQMI, metresText, numberText } from './density-units';

describe('densityIn', () => {
  // [S] NIST Handbook 44, Appendix C: 1 mile = 1.609344 km exactly, so 1 sq mi = 2.589988110336 km².
  it('converts per km² to per sq mi by the exact square-mile factor', () => {
    expect(KM2_PER_SQMI).toBeCloseTo(1.609344 ** 2, 12);
    expect(densityIn(100, 'sqmi')).toBeCloseTo(258.9988110336, 9);
    expect(densityIn(100, 'km2')).toBe(100);
  });
});

describe('areaIn', () => {
  it('turns km² into sq mi with the same factor', () => {
    expect(areaIn(KM2_PER_SQMI * 3, 'sqmi')).toBeCloseTo(3, 12);
  });
});

describe('numberText', () => {
  it('keeps about three significant figures', () => {
    expect(numberText(1249.6)).toBe('1,250');
    expect(numberText(12.44)).toBe('12.4');
    expect(numberText(0.031234)).toBe('0.0312');
  });
});

describe('metresText', () => {
  it('switches to kilometres from 10 km', () => {
    expect(metresText(850.4)).toBe('850 m');
    expect(metresText(12_500)).toBe('12.5 km');
  });
});

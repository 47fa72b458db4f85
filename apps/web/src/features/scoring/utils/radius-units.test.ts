import { describe, expect, it } from 'vitest';
import { radiiConverted, radiusText } from './radius-units';

// [S] 1 international mile = 1,609.344 m exactly (NIST Handbook 44, appendix C).
describe('radiusText', () => {
  it('shows metres in km or miles with the unit', () => {
    expect(radiusText(1609.344, 'mi')).toBe('1 mi');
    expect(radiusText(1500, 'km')).toBe('1.5 km');
    expect(radiusText(5000, 'mi')).toBe('3.11 mi');
  });
});

describe('radiiConverted', () => {
  it('converts typed radii between km and miles to 0.01', () => {
    expect(radiiConverted(['1', '3', '5'], 'km', 'mi')).toEqual(['0.62', '1.86', '3.11']);
    expect(radiiConverted(['1', '2'], 'mi', 'km')).toEqual(['1.61', '3.22']);
  });

  it('keeps what is not a number as typed, and leaves a same-unit list alone', () => {
    expect(radiiConverted(['', 'abc', '2,5'], 'km', 'mi')).toEqual(['', 'abc', '1.55']);
    expect(radiiConverted(['1'], 'km', 'km')).toEqual(['1']);
  });
});

import { describe, expect, it } from 'vitest';
import { formatMetres, formatNumber } from './format-number.js';

describe('formatNumber', () => {
  it('groups thousands and drops trailing zeros', () => {
    expect(formatNumber(9_000_000)).toBe('9,000,000');
    expect(formatNumber(1234.5, 2)).toBe('1,234.5');
    expect(formatNumber(0.2154, 3)).toBe('0.215');
    expect(formatNumber(-1500)).toBe('-1,500');
    expect(formatNumber(999)).toBe('999');
  });
});

describe('formatMetres', () => {
  it('uses metres below 10 km and km above', () => {
    expect(formatMetres(75)).toBe('75 m');
    expect(formatMetres(2500)).toBe('2,500 m');
    expect(formatMetres(12_500)).toBe('12.5 km');
    expect(formatMetres(2.5)).toBe('2.5 m');
  });
});

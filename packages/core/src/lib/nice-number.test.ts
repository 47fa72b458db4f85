import { describe, expect, it } from 'vitest';
import { niceCeil, niceFloor } from './nice-number.js';

describe('niceFloor', () => {
  it('rounds down to 1, 2, 2.5 or 5 × 10^k', () => {
    expect(niceFloor(37)).toBe(25);
    expect(niceFloor(53.9)).toBe(50);
    expect(niceFloor(199)).toBe(100);
    expect(niceFloor(0.9)).toBeCloseTo(0.5, 12);
    expect(niceFloor(250)).toBe(250);
    expect(niceFloor(20)).toBe(20);
  });
});

describe('niceCeil', () => {
  it('rounds up to 1, 2, 2.5 or 5 × 10^k', () => {
    expect(niceCeil(37)).toBe(50);
    expect(niceCeil(2)).toBe(2);
    expect(niceCeil(51)).toBe(100);
    expect(niceCeil(2.1)).toBe(2.5);
  });
});

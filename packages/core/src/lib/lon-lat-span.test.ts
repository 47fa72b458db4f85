import { describe, expect, it } from 'vitest';
import { lonLatSpan } from './lon-lat-span.js';

describe('lonLatSpan', () => {
  it('measures ordinary data directly', () => {
    const s = lonLatSpan(Float64Array.of(2, 4, 6), Float64Array.of(40, 41, 45));
    expect(s.west).toBe(2);
    expect(s.east).toBe(6);
    expect(s.lonSpan).toBe(4);
    expect(s.meanLon).toBe(4);
    expect(s.meanLat).toBe(42);
    expect(s.crossesAntimeridian).toBe(false);
  });
  it('measures data across the antimeridian the short way', () => {
    const s = lonLatSpan(Float64Array.of(179, -179, 179.5), Float64Array.of(0, 1, 2));
    expect(s.lonSpan).toBeCloseTo(2, 12);
    expect(s.west).toBe(179);
    expect(s.east).toBeCloseTo(181, 12);
    expect(s.meanLon).toBeCloseTo(179.8333333, 6);
    expect(s.crossesAntimeridian).toBe(true);
  });
  it('keeps negative longitudes negative when all data is in the west', () => {
    const s = lonLatSpan(Float64Array.of(-10, -12), Float64Array.of(0, 0));
    expect(s.west).toBe(-12);
    expect(s.east).toBe(-10);
    expect(s.meanLon).toBe(-11);
    expect(s.crossesAntimeridian).toBe(false);
  });
});

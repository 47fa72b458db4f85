import { describe, expect, it } from 'vitest';
import { CoreError } from '../errors.js';
import { pointsFromLonLat } from './points-from-lon-lat.js';

function errorOf(fn: () => unknown): CoreError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CoreError) return e;
    throw e;
  }
  throw new Error('expected a CoreError');
}

describe('pointsFromLonLat', () => {
  it('copies valid points into typed arrays, weights default to 1', () => {
    const p = pointsFromLonLat([-31.8, -31.7], [-38, -37.9]);
    expect(Array.from(p.lon)).toEqual([-31.8, -31.7]);
    expect(Array.from(p.w)).toEqual([1, 1]);
  });
  it('rejects empty input with EMPTY_POINTS', () => {
    expect(errorOf(() => pointsFromLonLat([], [])).code).toBe('EMPTY_POINTS');
  });
  it('rejects NaN and ∞ with INVALID_COORDINATE and the index', () => {
    const e = errorOf(() => pointsFromLonLat([1, NaN], [2, 3]));
    expect(e.code).toBe('INVALID_COORDINATE');
    expect(e.details).toMatchObject({ index: 1 });
    expect(e.message).toMatch(/^point 1: lon/);
    expect(errorOf(() => pointsFromLonLat([1], [Infinity])).field).toBe('lat');
  });
  it('rejects |lat| > 90 and suggests swapped columns when the longitude would be a valid latitude', () => {
    const e = errorOf(() => pointsFromLonLat([10, 45.5], [50, 120.25]));
    expect(e.code).toBe('COORDINATE_OUT_OF_RANGE');
    expect(e.details).toEqual({ index: 1, value: 120.25 });
    expect(e.message).toMatch(/latitude 120\.25 is outside -90\.\.90/);
    expect(e.message).toMatch(/swapped/);
    expect(errorOf(() => pointsFromLonLat([150], [95])).message).not.toMatch(/swapped/);
  });
  it('rejects |lon| > 180 with the value', () => {
    const e = errorOf(() => pointsFromLonLat([500000], [10]));
    expect(e.code).toBe('COORDINATE_OUT_OF_RANGE');
    expect(e.message).toMatch(/longitude 500,000 is outside -180\.\.180/);
  });
  it('rejects negative and non-finite weights with INVALID_WEIGHT', () => {
    expect(errorOf(() => pointsFromLonLat([1, 2], [1, 2], [1, -1])).code).toBe('INVALID_WEIGHT');
    expect(errorOf(() => pointsFromLonLat([1, 2], [1, 2], [NaN, 1])).details).toMatchObject({ index: 0 });
  });
  it('rejects all-zero weights with ZERO_TOTAL_WEIGHT', () => {
    expect(errorOf(() => pointsFromLonLat([1, 2], [1, 2], [0, 0])).code).toBe('ZERO_TOTAL_WEIGHT');
  });
  it('rejects mismatched lengths', () => {
    expect(errorOf(() => pointsFromLonLat([1, 2], [1])).code).toBe('INVALID_ARGUMENT');
    expect(errorOf(() => pointsFromLonLat([1, 2], [1, 2], [1])).field).toBe('weight');
  });
});

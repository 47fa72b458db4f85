import { describe, expect, it } from 'vitest';
import { customerPointsPack, customerPointsUnpack } from './customer-points.js';

describe('customerPointsPack / customerPointsUnpack', () => {
  it('writes [lon…, lat…, w…] as little-endian Float64 and reads it back', () => {
    const points = {
      lon: Float64Array.of(-38.5, -38.25, 1e-300),
      lat: Float64Array.of(44.5, 44.75, -0),
      w: Float64Array.of(1, 0, 123.456),
      count: 3,
    };
    const blob = customerPointsPack(points);
    expect(blob.byteLength).toBe(72);
    expect(blob.readDoubleLE(8)).toBe(-38.25);
    expect(blob.readDoubleLE(3 * 8)).toBe(44.5);
    expect(blob.readDoubleLE(8 * 8)).toBe(123.456);
    const back = customerPointsUnpack(blob);
    expect(back.count).toBe(3);
    expect(Array.from(back.lon)).toEqual(Array.from(points.lon));
    expect(Array.from(back.w)).toEqual(Array.from(points.w));
  });
  it('packs a slice', () => {
    const points = {
      lon: Float64Array.of(1, 2, 3),
      lat: Float64Array.of(4, 5, 6),
      w: Float64Array.of(7, 8, 9),
      count: 3,
    };
    expect(Array.from(customerPointsUnpack(customerPointsPack(points, 1, 2)).lat)).toEqual([5, 6]);
  });
  it('refuses a blob that is not whole points', () => {
    expect(() => customerPointsUnpack(new Uint8Array(25))).toThrow('multiple of 24 bytes (got 25)');
  });
});

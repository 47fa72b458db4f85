import { describe, expect, it } from 'vitest';
import { kernelReach } from '../kernels/kernels.js';
import { gridFromPoints } from './grid-from-points.js';

describe('gridFromPoints', () => {
  const points = { x: Float64Array.of(1000, 3000, 99_999), y: Float64Array.of(2000, 2500, 99_999), w: Float64Array.of(1, 2, 0) };
  it('covers the weighted points padded by the kernel reach', () => {
    const g = gridFromPoints(points, 100, kernelReach('quartic', 500));
    expect(g).toEqual({ originX: 500, originY: 1500, cellSize: 100, width: 30, height: 15 });
  });
  it('pads a Gaussian by 6 sd', () => {
    const g = gridFromPoints(points, 100, kernelReach('gaussian', 100));
    expect(g.originX).toBe(400);
    expect(g.width).toBe(32);
  });
  it('rejects empty input, all-zero weights and negative padding', () => {
    const empty = { x: new Float64Array(0), y: new Float64Array(0), w: new Float64Array(0) };
    expect(() => gridFromPoints(empty, 10, 0)).toThrow(/no points/);
    expect(() => gridFromPoints({ ...points, w: new Float64Array(3) }, 10, 0)).toThrow(/zero weight/);
    expect(() => gridFromPoints(points, 10, -1)).toThrow(/padding must be a number of metres ≥ 0 \(got -1\)/);
  });
});

import { describe, expect, it } from 'vitest';
import { pointsMergeCoincident } from './points-merge-coincident.js';

describe('pointsMergeCoincident', () => {
  it('merges exact duplicates, adds weights, keeps first-occurrence order', () => {
    const m = pointsMergeCoincident({
      x: Float64Array.of(0, 5, 0, 0, 5),
      y: Float64Array.of(1, 1, 1, 2, 1),
      w: Float64Array.of(2, 1, 3, 4, 0.5),
    });
    expect(Array.from(m.x)).toEqual([0, 5, 0]);
    expect(Array.from(m.y)).toEqual([1, 1, 2]);
    expect(Array.from(m.w)).toEqual([5, 1.5, 4]);
    expect(Array.from(m.count)).toEqual([2, 2, 1]);
  });
  it('keeps points that differ by the smallest amount apart', () => {
    const m = pointsMergeCoincident({ x: Float64Array.of(1, 1 + Number.EPSILON), y: Float64Array.of(0, 0), w: Float64Array.of(1, 1) });
    expect(m.x.length).toBe(2);
  });
  it('treats -0 and 0 as the same location', () => {
    const m = pointsMergeCoincident({ x: Float64Array.of(-0, 0), y: Float64Array.of(0, 0), w: Float64Array.of(1, 1) });
    expect(m.x.length).toBe(1);
  });
  it('agrees with a string-keyed count on 50,000 rounded coordinates and keeps the total weight', () => {
    const n = 50_000;
    const x = Float64Array.from({ length: n }, (_, i) => ((i * 7919) % 173) * 10);
    const y = Float64Array.from({ length: n }, (_, i) => ((i * 104729) % 211) * -5);
    const w = Float64Array.from({ length: n }, (_, i) => (i % 5) + 0.5);
    const m = pointsMergeCoincident({ x, y, w });
    expect(m.x.length).toBe(new Set(Array.from(x, (v, i) => `${v} ${y[i]}`)).size);
    expect(m.w.reduce((s, v) => s + v, 0)).toBeCloseTo(w.reduce((s, v) => s + v, 0), 6);
    expect(m.count.reduce((s, v) => s + v, 0)).toBe(n);
  });
  it('returns empty output for empty input', () => {
    expect(pointsMergeCoincident({ x: new Float64Array(0), y: new Float64Array(0), w: new Float64Array(0) }).x.length).toBe(0);
  });
});

import { ticks } from 'd3-array';
import { describe, expect, it } from 'vitest';
import { legendTicks } from './legend-ticks';

describe('legendTicks', () => {
  it('gives the same round ticks as d3-array’s ticks()', () => {
    // [S] outside reference: d3-array `ticks` (same 1-2-5 rule), over ranges a density legend meets.
    for (const [start, stop, count] of [
      [0, 437, 5],
      [0, 1, 5],
      [0, 0.0371, 4],
      [0, 12_873.4, 6],
      [-0.8, 0.8, 5],
      [0, 96_000, 5],
      [3, 7, 10],
    ]) {
      expect(legendTicks(start, stop, count)).toEqual(ticks(start, stop, count));
    }
  });

  it('returns the single value for an empty range', () => {
    expect(legendTicks(4, 4)).toEqual([4]);
  });

  it('rejects a reversed or non-finite range', () => {
    expect(() => legendTicks(5, 1)).toThrow('legend range must be finite with stop ≥ start (got 5..1)');
    expect(() => legendTicks(0, Number.NaN)).toThrow('legend range must be finite');
  });
});

import { describe, expect, it } from 'vitest';
import { contourIsolines } from './contour-isolines.js';

describe('contourIsolines', () => {
  it('a closed hill gives one closed line around it', () => {
    const spec = { originX: 0, originY: 0, cellSize: 10, width: 5, height: 5 };
    const values = new Float64Array(25);
    values[12] = 1;
    const lines = contourIsolines(values, spec, [0.5]).features[0].geometry.coordinates;
    expect(lines.length).toBe(1);
    expect(lines[0][0]).toEqual(lines[0][lines[0].length - 1]);
  });
  it('a ramp gives one open line across the grid, stopping at the outermost cell centres', () => {
    // v = i: the level 1.5 crosses between columns 1 and 2, i.e. x = originX + 2·cellSize.
    const spec = { originX: 100, originY: 0, cellSize: 10, width: 4, height: 3 };
    const values = Float64Array.from({ length: 12 }, (_, k) => k % 4);
    const lines = contourIsolines(values, spec, [1.5]).features[0].geometry.coordinates;
    expect(lines.length).toBe(1);
    for (const [x] of lines[0]) expect(x).toBeCloseTo(120, 9);
    const ys = lines[0].map((p) => p[1]);
    // From the southern row's centre line (y = 5) to the northern one (y = 25).
    expect(Math.min(...ys)).toBeCloseTo(5, 9);
    expect(Math.max(...ys)).toBeCloseTo(25, 9);
  });
});

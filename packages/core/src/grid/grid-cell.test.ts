import { describe, expect, it } from 'vitest';
import { gridBilinearAt } from './grid-bilinear-at.js';
import { gridCellCenter, gridCellIndexAt } from './grid-cell.js';

const spec = { originX: 100, originY: 200, cellSize: 10, width: 4, height: 3 };

describe('gridCellCenter / gridCellIndexAt', () => {
  it('places centres half a cell in from the origin, j = 0 in the south', () => {
    expect(gridCellCenter(spec, 0, 0)).toEqual([105, 205]);
    expect(gridCellCenter(spec, 3, 2)).toEqual([135, 225]);
  });
  it('finds the cell of a point and its own centre, half-open edges, -1 outside', () => {
    for (let j = 0; j < spec.height; j++) {
      for (let i = 0; i < spec.width; i++) {
        const [x, y] = gridCellCenter(spec, i, j);
        expect(gridCellIndexAt(spec, x, y)).toBe(i + j * spec.width);
      }
    }
    expect(gridCellIndexAt(spec, 110, 200)).toBe(1);
    expect(gridCellIndexAt(spec, 140, 200)).toBe(-1);
    expect(gridCellIndexAt(spec, 99.99, 205)).toBe(-1);
    expect(gridCellIndexAt(spec, NaN, 205)).toBe(-1);
  });
});

describe('gridBilinearAt', () => {
  // Values of the plane v = 2x + 3y at the cell centres: bilinear interpolation reproduces it [D].
  const values = new Float64Array(12);
  for (let j = 0; j < 3; j++) for (let i = 0; i < 4; i++) values[i + j * 4] = 2 * (105 + 10 * i) + 3 * (205 + 10 * j);
  it('reproduces a linear surface between centres exactly', () => {
    for (const [x, y] of [[105, 205], [112.5, 217], [134.9, 224.9], [120, 210]]) {
      expect(gridBilinearAt(values, spec, x, y)).toBeCloseTo(2 * x + 3 * y, 9);
    }
  });
  it('holds the border centre value in the outer half cell and gives NaN outside', () => {
    expect(gridBilinearAt(values, spec, 101, 205)).toBeCloseTo(2 * 105 + 3 * 205, 9);
    expect(gridBilinearAt(values, spec, 99, 205)).toBeNaN();
    expect(gridBilinearAt(values, spec, 120, 231)).toBeNaN();
  });
  it('is NaN next to a NaN cell but exact on the centre of a valid neighbour', () => {
    const v = Float64Array.of(1, NaN, 3, 4);
    const s2 = { originX: 0, originY: 0, cellSize: 10, width: 2, height: 2 };
    expect(gridBilinearAt(v, s2, 10, 10)).toBeNaN();
    expect(gridBilinearAt(v, s2, 5, 5)).toBe(1);
    expect(gridBilinearAt(v, s2, 5, 10)).toBe(2);
  });
  it('works on a single-cell grid', () => {
    expect(gridBilinearAt(Float64Array.of(7), { originX: 0, originY: 0, cellSize: 1, width: 1, height: 1 }, 0.2, 0.9)).toBe(7);
  });
});

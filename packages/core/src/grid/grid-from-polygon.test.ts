import { describe, expect, it } from 'vitest';
import type { PlanarPolygon } from '../types.js';
import { gridCellCenter } from './grid-cell.js';
import { gridFromPolygon } from './grid-from-polygon.js';

/** Reference point-in-polygon: ray casting per point, even–odd over all rings (Shimrat 1962, ACM Algorithm 112) [S]. */
function insideRef(polys: PlanarPolygon[], x: number, y: number): boolean {
  let inside = false;
  for (const poly of polys) {
    for (const ring of poly) {
      for (let a = 0, b = ring.length - 1; a < ring.length; b = a++) {
        const [xa, ya] = ring[a];
        const [xb, yb] = ring[b];
        if (ya > y !== yb > y && x < ((xb - xa) * (y - ya)) / (yb - ya) + xa) inside = !inside;
      }
    }
  }
  return inside;
}

describe('gridFromPolygon', () => {
  it('marks the cells of a square exactly', () => {
    const { spec, mask, insideCells } = gridFromPolygon([[[0, 0], [100, 0], [100, 100], [0, 100]]], 10);
    expect(spec).toMatchObject({ width: 10, height: 10 });
    expect(insideCells).toBe(100);
    expect(mask.every((m) => m === 1)).toBe(true);
  });
  it('cuts out holes and handles concave outlines like per-point ray casting', () => {
    const poly: PlanarPolygon = [
      [[0, 0], [1000, 0], [1000, 600], [500, 250], [0, 600], [0, 0]],
      [[100, 100], [300, 100], [200, 200]],
    ];
    const { spec, mask } = gridFromPolygon(poly, 7.3, { padding: 15, align: false });
    let diff = 0;
    for (let j = 0; j < spec.height; j++) {
      for (let i = 0; i < spec.width; i++) {
        const [x, y] = gridCellCenter(spec, i, j);
        if ((mask[i + j * spec.width] === 1) !== insideRef([poly], x, y)) diff++;
      }
    }
    expect(diff).toBe(0);
  });
  it('accepts several polygons (an island beside a mainland)', () => {
    const polys: PlanarPolygon[] = [
      [[[0, 0], [50, 0], [50, 50], [0, 50]]],
      [[[80, 80], [100, 80], [100, 100], [80, 100]]],
    ];
    const { insideCells } = gridFromPolygon(polys, 10);
    expect(insideCells).toBe(25 + 4);
  });
  it('the area of a circle mask approaches πr² [D]', () => {
    const ring: Array<[number, number]> = [];
    for (let k = 0; k < 720; k++) ring.push([1000 * Math.cos((k * Math.PI) / 360), 1000 * Math.sin((k * Math.PI) / 360)]);
    const { spec, insideCells } = gridFromPolygon([ring], 5);
    expect((insideCells * spec.cellSize ** 2) / (Math.PI * 1e6)).toBeCloseTo(1, 3);
  });
  it('rejects rings with fewer than 3 points and non-finite vertices, naming where', () => {
    expect(() => gridFromPolygon([[[0, 0], [1, 1], [0, 0]]], 1)).toThrow(/polygon 0, ring 0 has 2 distinct point\(s\)/);
    expect(() => gridFromPolygon([[[0, 0], [1, 1], [NaN, 0]]], 1)).toThrow(/polygon 0, ring 0, point 2/);
    expect(() => gridFromPolygon([], 1)).toThrow(/has no rings/);
    expect(() => gridFromPolygon([[[0, 0], [1, 0], [1, 1]]], 1, { padding: -2 })).toThrow(/padding must be a number of metres ≥ 0/);
  });
  it('fails fast with GRID_TOO_LARGE before allocating the mask', () => {
    expect(() => gridFromPolygon([[[0, 0], [1e6, 0], [1e6, 1e6]]], 1)).toThrow(/cell size of 500 m or more fits/);
  });
});

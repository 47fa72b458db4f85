import { describe, expect, it } from 'vitest';
import { CoreError } from '../errors.js';
import { gridFromExtent } from './grid-from-extent.js';

function errorOf(fn: () => unknown): CoreError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CoreError) return e;
    throw e;
  }
  throw new Error('expected a CoreError');
}

describe('gridFromExtent', () => {
  it('snaps outward to whole multiples of the cell size', () => {
    expect(gridFromExtent({ minX: 10, minY: -5, maxX: 95, maxY: 40 }, 20)).toEqual({ originX: 0, originY: -20, cellSize: 20, width: 5, height: 3 });
  });
  it('does not add a column when the extent ends exactly on a cell edge', () => {
    expect(gridFromExtent({ minX: 0, minY: 0, maxX: 0.3, maxY: 0.3 }, 0.1)).toMatchObject({ width: 3, height: 3 });
  });
  it('always contains the extent, whatever the round-off', () => {
    for (const [minX, maxX, c] of [[19.99999999999, 60.00000000001, 20], [-0.30000000000000004, 0.7, 0.1], [1e6 + 0.1, 1e6 + 0.7, 0.1]]) {
      const g = gridFromExtent({ minX, minY: minX, maxX, maxY: maxX }, c);
      expect(g.originX).toBeLessThanOrEqual(minX);
      expect(g.originX + g.width * g.cellSize).toBeGreaterThanOrEqual(maxX);
    }
  });
  it('keeps the extent origin without alignment', () => {
    expect(gridFromExtent({ minX: 10, minY: 3, maxX: 95, maxY: 40 }, 20, { align: false })).toEqual({ originX: 10, originY: 3, cellSize: 20, width: 5, height: 2 });
  });
  it('gives one cell for a single-point extent', () => {
    expect(gridFromExtent({ minX: 40, minY: 40, maxX: 40, maxY: 40 }, 20)).toMatchObject({ width: 1, height: 1 });
  });
  it('rejects bad extents and cell sizes with specific codes', () => {
    expect(errorOf(() => gridFromExtent({ minX: 5, minY: 0, maxX: 1, maxY: 1 }, 1)).code).toBe('INVALID_EXTENT');
    expect(errorOf(() => gridFromExtent({ minX: NaN, minY: 0, maxX: 1, maxY: 1 }, 1)).code).toBe('INVALID_EXTENT');
    expect(errorOf(() => gridFromExtent({ minX: 0, minY: 0, maxX: 1, maxY: 1 }, -3)).message).toBe('cell size must be a positive number of metres (got -3)');
    expect(errorOf(() => gridFromExtent({ minX: 0, minY: 0, maxX: 1, maxY: 1 }, 0)).code).toBe('INVALID_CELL_SIZE');
  });
  it('fails fast with GRID_TOO_LARGE naming a cell size that fits', () => {
    const e = errorOf(() => gridFromExtent({ minX: 0, minY: 0, maxX: 150_000, maxY: 150_000 }, 50));
    expect(e.code).toBe('GRID_TOO_LARGE');
    expect(e.message).toMatch(/9,000,000 cells, which exceeds the 4,000,000-cell limit; a cell size of 75 m or more fits/);
    expect(e.details).toMatchObject({ suggestedCellSize: 75, cells: 9_000_000 });
    const fits = gridFromExtent({ minX: 0, minY: 0, maxX: 150_000, maxY: 150_000 }, 75);
    expect(fits.width * fits.height).toBeLessThanOrEqual(4_000_000);
  });
  it('the suggested size fits for an unaligned, awkward extent and a custom limit', () => {
    const extent = { minX: 1234.5, minY: -777.7, maxX: 98_765.4, maxY: 43_210.9 };
    const e = errorOf(() => gridFromExtent(extent, 10, { maxCells: 100_000 }));
    const c = e.details?.suggestedCellSize as number;
    const g = gridFromExtent(extent, c, { maxCells: 100_000 });
    expect(g.width * g.height).toBeLessThanOrEqual(100_000);
    // Two significant digits: one step smaller must not fit.
    const step = Math.pow(10, Math.floor(Math.log10(c)) - 1);
    expect(() => gridFromExtent(extent, c - step, { maxCells: 100_000 })).toThrow(/exceeds/);
  });
});

import { describe, expect, it } from 'vitest';
import { KDE_SUGGESTED_CELL_FRACTION } from '../kde/kde-cell-rule.js';
import { gridCellSizeSuggest } from './grid-cell-size-suggest.js';

describe('gridCellSizeSuggest', () => {
  it('rounds fraction × h down to 1, 2, 2.5 or 5 × 10^k m', () => {
    // quartic: 0.03 × 2500 = 75 → 50; gaussian: 0.06 × 1000 = 60 → 50.
    expect(gridCellSizeSuggest('quartic', 2500).value).toBe(50);
    expect(gridCellSizeSuggest('gaussian', 1000).value).toBe(50);
    for (const k of ['quartic', 'gaussian', 'epanechnikov'] as const) {
      const s = gridCellSizeSuggest(k, 1234);
      expect(s.value).toBeLessThanOrEqual(KDE_SUGGESTED_CELL_FRACTION[k] * 1234);
      expect(s.value).toBeGreaterThan(0.4 * KDE_SUGGESTED_CELL_FRACTION[k] * 1234);
    }
  });
  it('explains the choice in one line with units', () => {
    const s = gridCellSizeSuggest('quartic', 2500);
    expect(s.explanation).toMatch(/^50 m: at most 0\.03 × the 2,500 m radius/);
    expect(s.explanation).not.toMatch(/\n/);
    expect(gridCellSizeSuggest('gaussian', 1000).explanation).toMatch(/standard deviation/);
  });
  it('raises the cell size when the study area would exceed the cell limit, and says so', () => {
    const s = gridCellSizeSuggest('quartic', 2500, { minX: 0, minY: 0, maxX: 150_000, maxY: 150_000 });
    expect(s.value).toBe(75);
    expect(s.explanation).toMatch(/raised from 50 m so the study area fits the 4,000,000-cell limit/);
  });
  it('keeps the suggestion when the grid fits', () => {
    expect(gridCellSizeSuggest('quartic', 2500, { minX: 0, minY: 0, maxX: 50_000, maxY: 50_000 }).value).toBe(50);
  });
  it('rejects a bad bandwidth or kernel', () => {
    expect(() => gridCellSizeSuggest('quartic', -3)).toThrow('bandwidth must be a positive number of metres (got -3)');
    expect(() => gridCellSizeSuggest('box' as never, 100)).toThrow(/kernel must be one of/);
  });
});

import { describe, expect, it } from 'vitest';
import { randomSampleIndices } from './random-sample-indices.js';
import { randomSeeded } from './random-seeded.js';

describe('randomSampleIndices', () => {
  it('returns k distinct sorted indices below n', () => {
    const idx = randomSampleIndices(1000, 100, randomSeeded(5));
    expect(idx.length).toBe(100);
    for (let i = 1; i < idx.length; i++) expect(idx[i]).toBeGreaterThan(idx[i - 1]);
    expect(idx[99]).toBeLessThan(1000);
  });
  it('gives the same subsample for the same seed', () => {
    expect(randomSampleIndices(500, 20, randomSeeded(9))).toEqual(randomSampleIndices(500, 20, randomSeeded(9)));
  });
  it('picks every index equally often over many draws [D: uniform sampling without replacement, k/n each]', () => {
    const counts = new Float64Array(10);
    const rng = randomSeeded(11);
    for (let r = 0; r < 20_000; r++) for (const i of randomSampleIndices(10, 3, rng)) counts[i]++;
    for (const c of counts) expect(c / 20_000).toBeCloseTo(0.3, 1);
  });
});

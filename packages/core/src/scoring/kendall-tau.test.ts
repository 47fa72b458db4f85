import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { kendallTau } from './kendall-tau.js';

interface TauCase {
  name: string;
  a: number[];
  b: number[];
  tau: number;
}

// Written by tests/reference/kendall_tau.py (Debian python3-scipy) — rerun it to regenerate.
const reference = JSON.parse(
  readFileSync(join(import.meta.dirname, '../../../../tests/reference/expected/kendall-tau.json'), 'utf8'),
) as { source: string; cases: TauCase[] };

describe('kendallTau', () => {
  for (const c of reference.cases) {
    it(`matches scipy.stats.kendalltau for "${c.name}" within 1e-12 [S: scipy, tau-b]`, () => {
      expect(Math.abs(kendallTau(c.a, c.b) - c.tau)).toBeLessThan(1e-12);
    });
  }

  it('has reference cases with and without ties', () => {
    expect(reference.cases.length).toBeGreaterThanOrEqual(8);
    expect(reference.source).toMatch(/scipy/);
  });

  it('gives 2/3 for one adjacent swap among four — (5 − 1)/6 [closed form]', () => {
    expect(kendallTau([1, 2, 3, 4], [1, 3, 2, 4])).toBeCloseTo(2 / 3, 14);
  });

  it('is NaN when a list is entirely tied (scipy returns nan too) and rejects bad input', () => {
    expect(kendallTau([1, 1, 1], [1, 2, 3])).toBeNaN();
    expect(() => kendallTau([1, 2], [1, 2, 3])).toThrow(/same items \(got 2 and 3 values\)/);
    expect(() => kendallTau([1], [1])).toThrow(/at least 2 items/);
    expect(() => kendallTau([1, NaN], [1, 2])).toThrow(/item #2/);
  });
});

import { describe, expect, it } from 'vitest';
import { goldenSectionMinimize } from './golden-section.js';

describe('goldenSectionMinimize', () => {
  it('finds the minimum of a parabola and of cosh [D: closed forms]', () => {
    expect(goldenSectionMinimize((t) => (t - 2) ** 2, 0, 5, 1e-10)).toBeCloseTo(2, 8);
    expect(goldenSectionMinimize((t) => Math.cosh(t + 0.3), -4, 4, 1e-10)).toBeCloseTo(-0.3, 6);
  });
});

import { describe, expect, it } from 'vitest';
import { kernelByName } from '../kernels/kernels.js';
import { KERNEL_NAMES } from '../types.js';
import {
  kernelStencil,
  STENCIL_MASS_TOLERANCE,
  stencilRadius,
  stencilSubOffsets,
} from './kde-stencil.js';

describe('kernelStencil', () => {
  it('samples the quartic at cell centres when the lattice resolves it (K(0) = 3/π per h², DOMAIN.md [D])', () => {
    const s = kernelStencil(kernelByName('quartic'), 500, 50);
    expect(s.oversample).toBe(1);
    expect(s.radius).toBe(10);
    expect(s.values[10 + 10 * 21] * 500 * 500).toBeCloseTo(3 / Math.PI, 12);
  });

  for (const name of KERNEL_NAMES) {
    it(`${name}: carries the kernel's unit mass for h from 0.3 to 40 cells ([D] ∫K = 1)`, () => {
      for (const ratio of [0.3, 0.7, 1, 1.5, 2, 3, 5, 10, 40]) {
        const s = kernelStencil(kernelByName(name), ratio * 10, 10);
        // The uniform disc at h ≤ 1 cell needs more than the 64² cap; it still lands within 1 %.
        const tol = name === 'uniform' && ratio <= 1 ? 1e-2 : STENCIL_MASS_TOLERANCE;
        expect(Math.abs(s.mass - 1)).toBeLessThanOrEqual(tol);
      }
    });
  }

  it('switches to cell means for a kernel narrower than a cell', () => {
    expect(kernelStencil(kernelByName('quartic'), 5, 10).oversample).toBeGreaterThan(1);
  });

  it('reaches half a cell further with cell means', () => {
    expect(stencilRadius(kernelByName('quartic'), 100, 10, 1)).toBe(10);
    expect(stencilRadius(kernelByName('quartic'), 100, 10, 2)).toBe(11);
    expect(Array.from(stencilSubOffsets(2))).toEqual([-0.25, 0.25]);
  });
});

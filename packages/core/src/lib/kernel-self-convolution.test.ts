import { describe, expect, it } from 'vitest';
import { kernelByName } from '../kernels/kernels.js';
import { KERNEL_NAMES } from '../types.js';
import { kernelSelfConvolution } from './kernel-self-convolution.js';

describe('kernelSelfConvolution', () => {
  for (const name of KERNEL_NAMES) {
    const c = kernelSelfConvolution(name);
    const k = kernelByName(name);
    it(`${name}: C(0) equals the roughness R(K) = ∫K² [D: DOMAIN.md table]`, () => {
      expect(c.valueSq(0) / k.roughness).toBeCloseTo(1, 4);
    });
    it(`${name}: integrates to 1 over the plane (a convolution of two densities) [D]`, () => {
      let s = 0;
      const m = 4000;
      const top = c.reach;
      for (let a = 0; a < m; a++) {
        const r = ((a + 0.5) * top) / m;
        s += c.valueSq(r * r) * r;
      }
      expect((2 * Math.PI * s * top) / m).toBeCloseTo(1, 3);
    });
  }
  it('uniform: lens-area closed form at ρ = 1 is (2π/3 − √3/2)/π² [D]', () => {
    expect(kernelSelfConvolution('uniform').valueSq(1)).toBeCloseTo((2 * Math.PI / 3 - Math.sqrt(3) / 2) / Math.PI ** 2, 12);
  });
  it('Gaussian: C(ρ) = N(0, 2I) density e^{−ρ²/4}/(4π) [D]', () => {
    expect(kernelSelfConvolution('gaussian').valueSq(2)).toBeCloseTo(Math.exp(-0.5) / (4 * Math.PI), 12);
  });
  it('Epanechnikov: a brute-force 2-D sum agrees at ρ = 0.7 [D]', () => {
    const k = kernelByName('epanechnikov');
    const m = 800;
    let s = 0;
    for (let a = 0; a < m; a++) {
      for (let b = 0; b < m; b++) {
        const u = -1 + (2 * (a + 0.5)) / m;
        const v = -1 + (2 * (b + 0.5)) / m;
        s += k.valueSq(u * u + v * v) * k.valueSq((u - 0.7) ** 2 + v * v);
      }
    }
    expect(kernelSelfConvolution('epanechnikov').valueSq(0.49) / ((s * 4) / (m * m))).toBeCloseTo(1, 3);
  });
});

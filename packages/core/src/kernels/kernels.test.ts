import { describe, expect, it } from 'vitest';
import { KERNEL_NAMES } from '../types.js';
import { kernelBandwidthConvert, kernelByName, kernelSd } from './kernels.js';

// Check values for h = 1: ../shared DOMAIN.md table "Check values, h = 1" [D], derived from the
// closed forms K(r) = c(1 − r²)^q with c = (q+1)/π, the cone 3/π (1 − r) and (1/2π) e^{−r²/2}.
const CHECK: Record<string, { k0: number; k05: number; mass05: number; canonical: number }> = {
  gaussian: { k0: 0.159155, k05: 0.140454, mass05: 0.117503, canonical: 0.655841 },
  uniform: { k0: 0.31831, k05: 0.31831, mass05: 0.25, canonical: 1.311681 },
  epanechnikov: { k0: 0.63662, k05: 0.477465, mass05: 0.4375, canonical: 1.575247 },
  quartic: { k0: 0.95493, k05: 0.537148, mass05: 0.578125, canonical: 1.822708 },
  triweight: { k0: 1.27324, k05: 0.537148, mass05: 0.683594, canonical: 2.043205 },
  triangular: { k0: 0.95493, k05: 0.477465, mass05: 0.5, canonical: 1.663897 },
};

/** ∫∫ K(|u|) du by the radial integral 2π ∫ K(r) r dr, Simpson's rule. */
function radialIntegral(f: (r: number) => number, upper: number, n = 20000): number {
  const h = upper / n;
  // f(0)·0 vanishes; compact kernels are integrated to just inside their jump at r = 1.
  let s = f(upper) * upper;
  for (let i = 1; i < n; i++) {
    const r = i * h;
    s += (i % 2 ? 4 : 2) * f(r) * r;
  }
  return ((2 * Math.PI * h) / 3) * s;
}

describe('kernelByName', () => {
  for (const name of KERNEL_NAMES) {
    const k = kernelByName(name);
    const c = CHECK[name];
    it(`${name}: matches the published check values at r = 0 and 0.5`, () => {
      expect(k.value(0)).toBeCloseTo(c.k0, 5);
      expect(k.value(0.5)).toBeCloseTo(c.k05, 5);
      expect(k.valueSq(0.25)).toBeCloseTo(c.k05, 5);
      expect(k.massWithin(0.5)).toBeCloseTo(c.mass05, 5);
      expect(k.canonicalDelta).toBeCloseTo(c.canonical, 5);
    });
    it(`${name}: integrates to 1 over the plane`, () => {
      expect(radialIntegral((r) => k.value(r), k.reach - 1e-12)).toBeCloseTo(1, 6);
    });
    it(`${name}: mass within 0.5 agrees with the numeric integral`, () => {
      expect(radialIntegral((r) => k.value(r), 0.5)).toBeCloseTo(c.mass05, 6);
    });
    it(`${name}: second moment per axis equals the tabulated μ₂`, () => {
      // μ₂ per axis = ½ ∫∫ r² K dA
      expect(0.5 * radialIntegral((r) => r * r * k.value(r), k.reach - 1e-12)).toBeCloseTo(k.mu2, 6);
    });
  }

  it('rejects an unknown kernel name with the list of valid ones', () => {
    expect(() => kernelByName('boxcar')).toThrow(/kernel must be one of quartic, epanechnikov/);
  });
});

describe('kernelBandwidthConvert', () => {
  it('turns a Gaussian sd of 1 km into a quartic radius of about 2.779 km (DOMAIN.md [D], Marron & Nolan 1988)', () => {
    expect(kernelBandwidthConvert(1000, 'gaussian', 'quartic')).toBeCloseTo(2779.2, 0);
  });
  it('round-trips', () => {
    expect(kernelBandwidthConvert(kernelBandwidthConvert(500, 'triweight', 'uniform'), 'uniform', 'triweight')).toBeCloseTo(500, 9);
  });
});

describe('kernelSd', () => {
  it('is h/√8 for the quartic and h for the Gaussian', () => {
    expect(kernelSd('quartic', 2000)).toBeCloseTo(2000 / Math.sqrt(8), 9);
    expect(kernelSd('gaussian', 300)).toBe(300);
  });
});

import { describe, expect, it } from 'vitest';
import { randomSeeded } from './random-seeded.js';

describe('randomSeeded', () => {
  it('repeats the same stream for the same seed and differs for another seed', () => {
    const a = randomSeeded(7);
    const b = randomSeeded(7);
    const c = randomSeeded(8);
    const sa = [a.uniform(), a.uniform(), a.normal()];
    expect([b.uniform(), b.uniform(), b.normal()]).toEqual(sa);
    expect(c.uniform()).not.toBe(sa[0]);
  });

  it('gives uniforms in [0, 1) with mean 1/2 and variance 1/12 ([S] moments of U(0,1))', () => {
    const rng = randomSeeded(1);
    const n = 200_000;
    let s = 0;
    let s2 = 0;
    let outside = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.uniform();
      if (!(u >= 0 && u < 1)) outside++;
      s += u;
      s2 += u * u;
    }
    expect(outside).toBe(0);
    const mean = s / n;
    // Standard error of the mean is √(1/12/n) ≈ 6.5e-4; 5 SE tolerance.
    expect(Math.abs(mean - 0.5)).toBeLessThan(3.3e-3);
    expect(Math.abs(s2 / n - mean * mean - 1 / 12)).toBeLessThan(2e-3);
  });

  it('gives normals with mean 0, variance 1 and P(|z| < 1.96) ≈ 0.95 ([S] standard normal table)', () => {
    const rng = randomSeeded(2);
    const n = 200_000;
    let s = 0;
    let s2 = 0;
    let inside = 0;
    for (let i = 0; i < n; i++) {
      const z = rng.normal();
      s += z;
      s2 += z * z;
      if (Math.abs(z) < 1.959964) inside++;
    }
    expect(Math.abs(s / n)).toBeLessThan(0.012); // 5 SE
    expect(Math.abs(s2 / n - 1)).toBeLessThan(0.016); // SE of s² is √(2/n) ≈ 3.2e-3
    expect(Math.abs(inside / n - 0.95)).toBeLessThan(0.0025); // SE ≈ 4.9e-4
  });
});

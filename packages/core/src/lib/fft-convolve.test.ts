import { describe, expect, it } from 'vitest';
import { fft2dRealForward, fft2dRealInverseWindow, fftSize } from './fft-2d.js';
import { fftConvolutionApply, fftConvolutionPlan } from './fft-convolve.js';
import { randomSeeded } from './random-seeded.js';

/** Direct 2-D DFT of a real grid, the textbook definition F(u,v) = Σ f(x,y) e^{−2πi(ux/px + vy/py)} [S]. */
function dft2d(f: Float64Array, px: number, py: number, u: number, v: number): [number, number] {
  let re = 0;
  let im = 0;
  for (let y = 0; y < py; y++) {
    for (let x = 0; x < px; x++) {
      const a = -2 * Math.PI * ((u * x) / px + (v * y) / py);
      re += f[x + y * px] * Math.cos(a);
      im += f[x + y * px] * Math.sin(a);
    }
  }
  return [re, im];
}

describe('fftSize', () => {
  it('rounds up to a power of two of at least 2', () => {
    expect(fftSize(1)).toBe(2);
    expect(fftSize(1024)).toBe(1024);
    expect(fftSize(1100)).toBe(2048);
  });
});

describe('fft2dRealForward', () => {
  it('matches the direct DFT definition on a random grid ([S] DFT definition)', () => {
    const px = 16;
    const py = 8;
    const rng = randomSeeded(3);
    const f = new Float64Array(px * py);
    for (let k = 0; k < f.length; k++) f[k] = rng.uniform() - 0.3;
    const spec = fft2dRealForward(f, px, py);
    for (let u = 0; u <= px / 2; u++) {
      for (let v = 0; v < py; v++) {
        const [re, im] = dft2d(f, px, py, u, v);
        expect(spec[2 * (u * py + v)]).toBeCloseTo(re, 9);
        expect(spec[2 * (u * py + v) + 1]).toBeCloseTo(im, 9);
      }
    }
  });

  it('round-trips through the inverse window', () => {
    const px = 32;
    const py = 16;
    const rng = randomSeeded(4);
    const f = new Float64Array(px * py);
    for (let k = 0; k < f.length; k++) f[k] = rng.normal();
    const out = new Float64Array(10 * 5);
    fft2dRealInverseWindow(fft2dRealForward(f, px, py), px, py, 3, 7, 10, 5, out);
    for (let y = 0; y < 5; y++)
      for (let x = 0; x < 10; x++) expect(out[x + y * 10]).toBeCloseTo(f[3 + x + (7 + y) * px], 10);
  });
});

describe('fftConvolutionApply', () => {
  it('equals the direct linear convolution sum, with no wrap-around at the block edges', () => {
    const nx = 30;
    const ny = 20;
    const rx = 4;
    const ry = 3;
    const sw = 2 * rx + 1;
    const stencil = new Float64Array(sw * (2 * ry + 1));
    for (let dy = -ry; dy <= ry; dy++) {
      for (let dx = -rx; dx <= rx; dx++)
        stencil[dx + rx + (dy + ry) * sw] = 1 / (1 + dx * dx + 2 * dy * dy);
    }
    const plan = fftConvolutionPlan(stencil, rx, ry, nx, ny);
    expect(plan.px).toBe(32);
    expect(plan.py).toBe(32);
    const rng = randomSeeded(5);
    const input = new Float64Array(plan.px * plan.py);
    // Heavy values on the block edges would alias across the seam if the padding were wrong.
    for (let y = 0; y < ny; y++)
      for (let x = 0; x < nx; x++)
        input[x + y * plan.px] = x === 0 || y === ny - 1 ? 100 : rng.uniform();
    const w = nx - 2 * rx;
    const h = ny - 2 * ry;
    const out = new Float64Array(w * h);
    fftConvolutionApply(plan, input, rx, ry, w, h, out);
    for (let y = ry; y < ry + h; y++) {
      for (let x = rx; x < rx + w; x++) {
        let s = 0;
        for (let dy = -ry; dy <= ry; dy++) {
          for (let dx = -rx; dx <= rx; dx++)
            s += input[x - dx + (y - dy) * plan.px] * stencil[dx + rx + (dy + ry) * sw];
        }
        expect(out[x - rx + (y - ry) * w]).toBeCloseTo(s, 9);
      }
    }
  });

  it('refuses a window that would read across the periodic seam', () => {
    const stencil = new Float64Array(9).fill(1);
    const plan = fftConvolutionPlan(stencil, 1, 1, 8, 8);
    const input = new Float64Array(plan.px * plan.py);
    expect(() => fftConvolutionApply(plan, input, 0, 1, 6, 6, new Float64Array(36))).toThrow(
      /wrap-around/,
    );
  });
});

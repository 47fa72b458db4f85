import { describe, expect, it } from 'vitest';
import { colourTable, densityInterpolator, differenceInterpolator, fadedRampStops, rampStops } from './colour-ramp';

/** CIE 1976 L* of an sRGB colour (IEC 61966-2-1 transfer function, D65 luminance weights). */
function lightness(r: number, g: number, b: number): number {
  const linear = (c: number) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  const y = 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
}

describe('colourTable', () => {
  it('runs cividis from its published yellow end (low demand) to its dark blue end (high demand)', () => {
    // [M] cividis end points from the published table (Nuñez et al. 2018, PLoS ONE 13(7): e0199239):
    // 0 → (0.000, 0.135, 0.305), 1 → (0.996, 0.909, 0.218) in sRGB fractions; d3's fit is within a few levels.
    const { rgb, size } = colourTable(densityInterpolator);
    expect(size).toBe(256);
    const cividisEnd = [...rgb.slice(0, 3)]; // our t = 0 is cividis t = 1
    const cividisStart = [...rgb.slice(255 * 3, 256 * 3)];
    [0, 34.5, 77.7].forEach((v, i) => expect(Math.abs(cividisStart[i] - v)).toBeLessThanOrEqual(5));
    [254, 231.8, 55.6].forEach((v, i) => expect(Math.abs(cividisEnd[i] - v)).toBeLessThanOrEqual(15));
  });

  it('falls in lightness at every step and about evenly (perceptually ordered ramp)', () => {
    const { rgb } = colourTable(densityInterpolator, 32);
    const l = Array.from({ length: 32 }, (_, k) => lightness(rgb[k * 3], rgb[k * 3 + 1], rgb[k * 3 + 2]));
    const steps = l.slice(1).map((v, k) => l[k] - v);
    expect(Math.min(...steps)).toBeGreaterThan(0);
    // [CP] an even ramp keeps its lightness steps within a factor of ~2 of each other.
    expect(Math.max(...steps) / Math.min(...steps)).toBeLessThan(2.5);
  });

  it('gives the diverging ramp a light neutral middle and dark, different-hued ends', () => {
    const { rgb } = colourTable(differenceInterpolator, 101);
    const mid = lightness(rgb[150], rgb[151], rgb[152]);
    expect(mid).toBeGreaterThan(90);
    expect(lightness(rgb[0], rgb[1], rgb[2])).toBeLessThan(30);
    expect(lightness(rgb[300], rgb[301], rgb[302])).toBeLessThan(40);
    expect(rgb[2]).toBeGreaterThan(rgb[0]); // purple end: more blue than red
    expect(rgb[300]).toBeGreaterThan(rgb[302]); // orange-brown end: more red than blue
  });

  it('rejects a table with fewer than two entries', () => {
    expect(() => colourTable(densityInterpolator, 1)).toThrow('size must be an integer ≥ 2 (got 1)');
  });

  it('lists legend stops from the same interpolator', () => {
    expect(rampStops(densityInterpolator, 3)).toEqual([densityInterpolator(0), densityInterpolator(0.5), densityInterpolator(1)]);
  });

  it('gives the legend the same fade as the raster', () => {
    const stops = fadedRampStops(densityInterpolator, 21, 0.1);
    expect(stops[0]).toBe('rgba(253, 234, 69, 0)');
    expect(stops[1]).toMatch(/, 0\.5\)$/);
    expect(stops[2]).toMatch(/, 1\)$/);
  });
});

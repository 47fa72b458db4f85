import { describe, expect, it } from 'vitest';
import { colourTable, densityInterpolator, differenceInterpolator } from './colour-ramp';
import { rasterMaxAbs, rasterRgba } from './raster-colouring';

const cividis = colourTable(densityInterpolator);
const puor = colourTable(differenceInterpolator);

describe('rasterRgba', () => {
  it('leaves NaN and values under the floor transparent, everything else opaque', () => {
    const rgba = rasterRgba(new Float32Array([Number.NaN, 0.2, 0.5, 100]), cividis, { kind: 'sequential', max: 100, floor: 0.5 });
    expect([...rgba.slice(0, 8)]).toEqual([0, 0, 0, 0, 0, 0, 0, 0]);
    expect(rgba[11]).toBe(255);
    expect(rgba[15]).toBe(255);
  });

  it('puts 0 at the first colour and the maximum at the last, clamping above it', () => {
    const rgba = rasterRgba(new Float32Array([0, 100, 250]), cividis, { kind: 'sequential', max: 100, floor: 0 });
    expect([...rgba.slice(0, 3)]).toEqual([...cividis.rgb.slice(0, 3)]);
    expect([...rgba.slice(4, 7)]).toEqual([...cividis.rgb.slice(765, 768)]);
    expect([...rgba.slice(8, 11)]).toEqual([...cividis.rgb.slice(765, 768)]);
  });

  it('fades the lowest values in linearly when asked', () => {
    const rgba = rasterRgba(new Float32Array([2, 5, 10, 60]), cividis, { kind: 'sequential', max: 100, floor: 1, fade: 0.1 });
    expect([rgba[3], rgba[7], rgba[11], rgba[15]]).toEqual([51, 128, 255, 255]);
  });

  it('centres a diverging scale at 0 and hides near-zero differences', () => {
    const rgba = rasterRgba(new Float32Array([-10, 0, 10, 5]), puor, { kind: 'diverging', maxAbs: 10, floor: 0.1 });
    expect([...rgba.slice(0, 3)]).toEqual([...puor.rgb.slice(0, 3)]);
    expect(rgba[7]).toBe(0);
    expect([...rgba.slice(8, 11)]).toEqual([...puor.rgb.slice(765, 768)]);
    // 5 of ±10 is three quarters along the table: entry round(0.75 × 255) = 191.
    expect([...rgba.slice(12, 15)]).toEqual([...puor.rgb.slice(191 * 3, 192 * 3)]);
  });

  it('refuses a scale without a positive top', () => {
    expect(() => rasterRgba(new Float32Array([1]), cividis, { kind: 'sequential', max: 0, floor: 0 })).toThrow(
      'the top of the colour scale must be a positive number (got 0)',
    );
  });
});

describe('rasterMaxAbs', () => {
  it('ignores NaN and takes the larger side', () => {
    expect(rasterMaxAbs(new Float32Array([-3, 2, Number.NaN]))).toBe(3);
    expect(rasterMaxAbs(new Float32Array([Number.NaN]))).toBe(0);
  });
});

import { interpolateCividis, interpolatePuOr } from 'd3-scale-chromatic';

/** A colour ramp sampled into a lookup table: `size` entries of R, G, B (0–255). */
export type ColourTable = { size: number; rgb: Uint8Array };

/**
 * Demand surfaces: cividis (Nuñez, Anderton & Renslow 2018), lightness changing evenly and readable with
 * red–green colour blindness — run from its light end (low demand) to its dark end (high demand), so on a
 * light basemap the eye is drawn to where demand is, not to the wide, thin tails.
 */
export const densityInterpolator = (t: number) => interpolateCividis(1 - t);

/**
 * Differences: ColorBrewer PuOr, a diverging scheme listed as colour-blind safe; purple (t = 0) for less demand
 * in the compared surface, light neutral at 0, orange-brown (t = 1) for more.
 */
export const differenceInterpolator = interpolatePuOr;

function rgbFromCss(css: string): [number, number, number] {
  const match = /^rgb\((\d+),\s*(\d+),\s*(\d+)\)$/.exec(css);
  if (match) return [Number(match[1]), Number(match[2]), Number(match[3])];
  const hex = /^#([0-9a-f]{6})$/i.exec(css);
  if (hex) {
    const n = parseInt(hex[1], 16);
    return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
  }
  throw new Error(`colour must be rgb(r, g, b) or #rrggbb (got ${css})`);
}

/**
 * Samples an interpolator (t in [0, 1] → CSS colour) into a lookup table, entry k at t = k / (size − 1).
 * @param interpolator e.g. d3's `interpolateCividis`
 * @param size number of entries (≥ 2)
 * @returns the table
 * @example colourTable(densityInterpolator).rgb.slice(0, 3) // Uint8Array [253, 234, 69]
 */
export function colourTable(interpolator: (t: number) => string, size = 256): ColourTable {
  if (!Number.isInteger(size) || size < 2) throw new Error(`size must be an integer ≥ 2 (got ${size})`);
  const rgb = new Uint8Array(size * 3);
  for (let k = 0; k < size; k++) rgb.set(rgbFromCss(interpolator(k / (size - 1))), k * 3);
  return { size, rgb };
}

/**
 * CSS gradient stops for a legend bar drawn with the same interpolator as the map.
 * @param interpolator the ramp
 * @param steps number of stops (≥ 2)
 * @returns colours from t = 0 to t = 1
 * @example rampStops(densityInterpolator, 3) // ['rgb(253, 234, 69)', 'rgb(127, 124, 117)', 'rgb(0, 32, 81)']
 */
export function rampStops(interpolator: (t: number) => string, steps = 11): string[] {
  return Array.from({ length: steps }, (_, k) => interpolator(k / (steps - 1)));
}

/**
 * Legend stops matching a raster that fades in over the low end: colours as `rgba()` with the same alpha.
 * @param interpolator the ramp
 * @param steps number of stops (≥ 2)
 * @param fade share of the scale over which alpha rises from 0 to 1 (0 = opaque everywhere)
 * @returns CSS colours from t = 0 to t = 1
 * @example fadedRampStops(densityInterpolator, 11, 0.1)[0] // 'rgba(253, 234, 69, 0)'
 */
export function fadedRampStops(interpolator: (t: number) => string, steps = 21, fade = 0): string[] {
  return Array.from({ length: steps }, (_, k) => {
    const t = k / (steps - 1);
    const [r, g, b] = rgbFromCss(interpolator(t));
    const alpha = fade > 0 && t < fade ? Math.round((t / fade) * 100) / 100 : 1;
    return `rgba(${r}, ${g}, ${b}, ${alpha})`;
  });
}

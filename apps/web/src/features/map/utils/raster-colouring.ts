import type { ColourTable } from './colour-ramp';

/** How raster values map onto a colour table. */
export type RasterColourScale =
  /**
   * Sequential: 0 → first colour, `max` → last; values below `floor` and NaN are transparent; up to
   * `fade` × max the alpha rises linearly from 0, so thin tails blend into the basemap.
   */
  | { kind: 'sequential'; max: number; floor: number; fade?: number }
  /** Diverging around 0: −`maxAbs` → first colour, +`maxAbs` → last; |v| below `floor` and NaN are transparent. */
  | { kind: 'diverging'; maxAbs: number; floor: number };

/** Values below this share of the top of the scale are left transparent so the basemap shows through. */
export const RASTER_FLOOR_SHARE = 0.005;

/** Demand surfaces fade in over the lowest 10 % of the scale (alpha 0 → 1). */
export const RASTER_FADE_SHARE = 0.1;

/**
 * Colours a raster into RGBA bytes for a canvas `ImageData` (same row order as the values).
 * @param values raster values, row-major
 * @param table the colour lookup table
 * @param scale sequential or diverging scale
 * @returns RGBA, 4 bytes per value; alpha 0 for NaN and for values under the floor, rising through the fade, 255 above it
 * @example rasterRgba(raster.values, colourTable(densityInterpolator), { kind: 'sequential', max: raster.max, floor: raster.max * RASTER_FLOOR_SHARE })
 */
export function rasterRgba(values: Float32Array, table: ColourTable, scale: RasterColourScale): Uint8ClampedArray {
  const top = scale.kind === 'sequential' ? scale.max : scale.maxAbs;
  if (!(top > 0) || !Number.isFinite(top)) throw new Error(`the top of the colour scale must be a positive number (got ${top})`);
  const out = new Uint8ClampedArray(values.length * 4);
  const last = table.size - 1;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) continue;
    let t: number;
    if (scale.kind === 'sequential') {
      if (v < scale.floor) continue;
      t = v / top;
    } else {
      if (Math.abs(v) < scale.floor) continue;
      t = (v / top + 1) / 2;
    }
    const k = Math.round(Math.max(0, Math.min(1, t)) * last) * 3;
    out[i * 4] = table.rgb[k];
    out[i * 4 + 1] = table.rgb[k + 1];
    out[i * 4 + 2] = table.rgb[k + 2];
    out[i * 4 + 3] = scale.kind === 'sequential' && scale.fade && t < scale.fade ? Math.round((255 * t) / scale.fade) : 255;
  }
  return out;
}

/**
 * The largest |value| of a raster (for a difference scale centred at 0), ignoring NaN.
 * @param values raster values
 * @returns max |v|, or 0 when there is no finite value
 * @example rasterMaxAbs(new Float32Array([-3, 2, NaN])) // 3
 */
export function rasterMaxAbs(values: Float32Array): number {
  let m = 0;
  for (let i = 0; i < values.length; i++) {
    const a = Math.abs(values[i]);
    if (a > m) m = a;
  }
  return m;
}

import { CoreError } from '../errors.js';
import type { GridSpec } from '../types.js';

/** One percent-volume contour level. */
export interface PercentVolumeLevel {
  /** Share of the total demand inside, percent. */
  percent: number;
  /** Surface value at the boundary: the cells at or above it hold the share. */
  threshold: number;
  /** Area of those cells, m². */
  area_m2: number;
  /** True when a border cell is at or above the threshold: the grid may cut the region short. */
  clipped: boolean;
}

/**
 * Percent-volume contour levels, the smallest region holding a share p of the demand (Jennrich &
 * Turner 1969, "Measurement of non-circular home range", J. Theor. Biol. 22:227–237): sort cells
 * by value, largest first, accumulate value × cell area up to p × total; the level is that cell's
 * value. Non-finite and negative cells (masked, or FFT round-off) count as zero.
 *
 * @param values surface values (e.g. weight per km²), row-major i + j·width
 * @param spec the grid
 * @param percents shares in (0, 100] (default 50, 75, 90)
 * @returns one level per percent
 * @throws CoreError INVALID_ARGUMENT for a size mismatch, bad percents or an all-zero surface
 * @example
 * contourPercentVolume(surface, spec); // [{ percent: 50, threshold, area_m2, clipped }, …]
 */
export function contourPercentVolume(values: ArrayLike<number>, spec: GridSpec, percents: number[] = [50, 75, 90]): PercentVolumeLevel[] {
  const { width, height } = spec;
  if (values.length !== width * height) {
    throw new CoreError('INVALID_ARGUMENT', `values must have width × height = ${width * height} entries (got ${values.length})`, 'values');
  }
  for (const p of percents) {
    if (typeof p !== 'number' || !(p > 0 && p <= 100)) {
      throw new CoreError('INVALID_ARGUMENT', `contour percents must be numbers in (0, 100] (got ${String(p)})`, 'percents');
    }
  }
  let m = 0;
  const sorted = new Float64Array(values.length);
  let total = 0;
  for (let c = 0; c < values.length; c++) {
    const v = values[c];
    if (v > 0 && Number.isFinite(v)) {
      sorted[m++] = v;
      total += v;
    }
  }
  if (!(total > 0)) {
    throw new CoreError('INVALID_ARGUMENT', 'the surface is zero everywhere, so it has no percent-volume contours', 'values');
  }
  const asc = sorted.subarray(0, m).sort();
  const cellArea = spec.cellSize * spec.cellSize;
  const border = borderMax(values, width, height);
  return percents.map((percent) => {
    const target = (percent / 100) * total;
    let acc = 0;
    let k = m - 1;
    for (; k > 0; k--) {
      acc += asc[k];
      if (acc >= target) break;
    }
    const threshold = asc[k];
    // Ties at the threshold are inside too: count every cell ≥ threshold.
    let first = k;
    while (first > 0 && asc[first - 1] === threshold) first--;
    return { percent, threshold, area_m2: (m - first) * cellArea, clipped: border >= threshold };
  });
}

function borderMax(values: ArrayLike<number>, width: number, height: number): number {
  let best = -Infinity;
  const see = (v: number): void => {
    if (v > best) best = v;
  };
  for (let i = 0; i < width; i++) {
    see(values[i]);
    see(values[i + (height - 1) * width]);
  }
  for (let j = 0; j < height; j++) {
    see(values[j * width]);
    see(values[width - 1 + j * width]);
  }
  return best;
}

import { closeSync, openSync, writeSync } from 'node:fs';
import type { GridSpec } from '../types.js';

/** Converts planar cell centres (metres) to lon/lat degrees. */
export type CentreConvert = (x: Float64Array, y: Float64Array) => { a: Float64Array; b: Float64Array };

/** Rows per block: converts and writes ~ 4 MB of text at a time. */
const ROWS_PER_BLOCK = 65_536;

/**
 * Writes a surface as CSV `x,y,density`: one row per cell centre, south row first, west to east;
 * x,y in the input's units, density in weighted points per km². Density is written in
 * JavaScript's shortest round-trip form (reading it back gives the same double). Planar
 * coordinates (no `convert`) are exact too; lon/lat get 7 decimals (≈ 1 cm), which keeps a
 * million-row file quick to write.
 *
 * @param path output file
 * @param intensity weight per km², row-major (i + j·width, j = 0 south)
 * @param spec the grid (planar metres)
 * @param convert cell centre conversion to lon/lat; omit for planar metres
 * @returns nothing
 * @example
 * densityCsvWrite('out.csv', surface.intensity, spec);
 */
export function densityCsvWrite(path: string, intensity: Float64Array, spec: GridSpec, convert?: CentreConvert): void {
  const { originX, originY, cellSize, width, height } = spec;
  const total = width * height;
  const fd = openSync(path, 'w');
  try {
    writeSync(fd, 'x,y,density\n');
    if (!convert) {
      // Planar centres repeat along columns and rows: format each x and y once.
      const xs = Array.from({ length: width }, (_, i) => `${originX + (i + 0.5) * cellSize},`);
      const ys = Array.from({ length: height }, (_, j) => `${originY + (j + 0.5) * cellSize},`);
      for (let j = 0; j < height; j++) {
        const lines = new Array<string>(width);
        for (let i = 0; i < width; i++) lines[i] = `${xs[i]}${ys[j]}${intensity[i + j * width]}\n`;
        writeSync(fd, lines.join(''));
      }
      return;
    }
    for (let start = 0; start < total; start += ROWS_PER_BLOCK) {
      const end = Math.min(total, start + ROWS_PER_BLOCK);
      const xs = new Float64Array(end - start);
      const ys = new Float64Array(end - start);
      for (let c = start; c < end; c++) {
        xs[c - start] = originX + ((c % width) + 0.5) * cellSize;
        ys[c - start] = originY + (Math.floor(c / width) + 0.5) * cellSize;
      }
      const { a, b } = convert(xs, ys);
      const lines = new Array<string>(end - start);
      for (let k = 0; k < lines.length; k++) lines[k] = `${a[k].toFixed(7)},${b[k].toFixed(7)},${intensity[start + k]}\n`;
      writeSync(fd, lines.join(''));
    }
  } finally {
    closeSync(fd);
  }
}

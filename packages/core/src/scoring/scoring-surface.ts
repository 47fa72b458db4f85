import { CoreError } from '../errors.js';
import type { GridSpec } from '../types.js';

/** m² per km². */
const M2_PER_KM2 = 1e6;

/**
 * A demand surface as scoring reads it: the grid (planar metres, j = 0 the southern row) and
 * λ̂ per km², row-major i + j·width — the `intensity` of a density surface.
 */
export interface ScoringSurface {
  spec: GridSpec;
  values: Float64Array;
}

/** The cells that hold demand, packed: centres in metres and demand W = λ̂·A_cell. */
export interface DemandCells {
  x: Float64Array;
  y: Float64Array;
  demand: Float64Array;
  /** Σ demand over the cells taken (the whole surface unless a row range was asked for). */
  total: number;
  /**
   * Runs of consecutive demand cells within a grid row, four integers each: row j, first column
   * i0, end column i1 (exclusive), index of the run's first cell in the packed arrays.
   */
  runs: Int32Array;
  /** Grid rows the cells come from: rowStart ≤ j < rowEnd. */
  rowStart: number;
  rowEnd: number;
}

/** A range of grid rows, rowStart ≤ j < rowEnd (j = 0 is the southern row). */
export type RowRange = readonly [rowStart: number, rowEnd: number];

/**
 * Checks a row range against a grid height; undefined means every row.
 *
 * @param rows the range or undefined
 * @param height grid rows
 * @returns the range as [start, end)
 * @example
 * rowRangeChecked([0, 500], 1000); // [0, 500]
 */
export function rowRangeChecked(rows: RowRange | undefined, height: number): [number, number] {
  if (rows === undefined) return [0, height];
  const [a, b] = Array.isArray(rows) ? rows : [NaN, NaN];
  if (!Number.isInteger(a) || !Number.isInteger(b) || a < 0 || b > height || a > b) {
    throw new CoreError('INVALID_ARGUMENT', `rows must be [rowStart, rowEnd] with whole numbers 0 ≤ rowStart ≤ rowEnd ≤ ${height} (got [${a}, ${b}])`, 'rows');
  }
  return [a, b];
}

/**
 * Checks a scoring surface: a well-formed grid and one finite, non-negative value per cell.
 *
 * @param surface the surface
 * @returns the same surface
 * @example
 * scoringSurfaceValidate({ spec, values: surface.intensity });
 */
export function scoringSurfaceValidate(surface: ScoringSurface): ScoringSurface {
  const { spec, values } = surface ?? ({} as ScoringSurface);
  if (!spec || !(spec.cellSize > 0) || !Number.isInteger(spec.width) || !Number.isInteger(spec.height) || spec.width < 1 || spec.height < 1) {
    throw new CoreError('INVALID_ARGUMENT', 'surface.spec must be a grid with a positive cell size and whole width and height ≥ 1', 'surface.spec');
  }
  if (!(values instanceof Float64Array) || values.length !== spec.width * spec.height) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `surface.values must be a Float64Array of width × height = ${spec.width * spec.height} values (got ${values?.length ?? 'none'})`,
      'surface.values',
    );
  }
  for (let c = 0; c < values.length; c++) {
    if (!(values[c] >= 0) || values[c] === Infinity) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `surface value at cell (${c % spec.width}, ${Math.floor(c / spec.width)}) is ${values[c]}; demand per km² must be finite and ≥ 0`,
        'surface.values',
      );
    }
  }
  return surface;
}

/**
 * Packs the cells with demand > 0 (zero cells add nothing to any Huff sum, so they are skipped),
 * row by row, and records where each row's runs of demand cells start.
 *
 * @param surface a validated surface, λ̂ per km²
 * @param rows only grid rows rowStart ≤ j < rowEnd (default all), to split work across threads
 * @returns centres (m), demand per cell (λ̂ × cell area in km²) and the runs
 * @example
 * const { demand, total } = demandCells(surface);
 */
export function demandCells(surface: ScoringSurface, rows?: RowRange): DemandCells {
  const { spec, values } = surface;
  const [rowStart, rowEnd] = rowRangeChecked(rows, spec.height);
  const areaKm2 = (spec.cellSize * spec.cellSize) / M2_PER_KM2;
  let n = 0;
  let nRuns = 0;
  for (let j = rowStart; j < rowEnd; j++) {
    let prev = false;
    for (let c = j * spec.width, e = c + spec.width; c < e; c++) {
      const on = values[c] > 0;
      if (on) n++;
      if (on && !prev) nRuns++;
      prev = on;
    }
  }
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const demand = new Float64Array(n);
  const runs = new Int32Array(4 * nRuns);
  let total = 0;
  let k = 0;
  let r = 0;
  for (let j = rowStart; j < rowEnd; j++) {
    const cy = spec.originY + (j + 0.5) * spec.cellSize;
    let runOpen = false;
    for (let i = 0; i < spec.width; i++) {
      const v = values[i + j * spec.width];
      if (!(v > 0)) {
        if (runOpen) runs[4 * r++ + 2] = i;
        runOpen = false;
        continue;
      }
      if (!runOpen) {
        runs[4 * r] = j;
        runs[4 * r + 1] = i;
        runs[4 * r + 3] = k;
        runOpen = true;
      }
      x[k] = spec.originX + (i + 0.5) * spec.cellSize;
      y[k] = cy;
      demand[k] = v * areaKm2;
      total += demand[k];
      k++;
    }
    if (runOpen) runs[4 * r++ + 2] = spec.width;
  }
  return { x, y, demand, total, runs, rowStart, rowEnd };
}

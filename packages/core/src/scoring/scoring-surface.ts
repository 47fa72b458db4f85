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
  /** Σ demand over the whole surface (customers, spend, … — the weight's unit). */
  total: number;
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
 * Packs the cells with demand > 0 (zero cells add nothing to any Huff sum, so they are skipped).
 *
 * @param surface a validated surface, λ̂ per km²
 * @returns centres (m) and demand per cell (λ̂ × cell area in km²)
 * @example
 * const { demand, total } = demandCells(surface);
 */
export function demandCells(surface: ScoringSurface): DemandCells {
  const { spec, values } = surface;
  const areaKm2 = (spec.cellSize * spec.cellSize) / M2_PER_KM2;
  let n = 0;
  for (let c = 0; c < values.length; c++) if (values[c] > 0) n++;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const demand = new Float64Array(n);
  let total = 0;
  let k = 0;
  for (let j = 0; j < spec.height; j++) {
    const cy = spec.originY + (j + 0.5) * spec.cellSize;
    for (let i = 0; i < spec.width; i++) {
      const v = values[i + j * spec.width];
      if (!(v > 0)) continue;
      x[k] = spec.originX + (i + 0.5) * spec.cellSize;
      y[k] = cy;
      demand[k] = v * areaKm2;
      total += demand[k];
      k++;
    }
  }
  return { x, y, demand, total };
}

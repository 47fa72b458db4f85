import { throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import { huffSettings, type HuffOptions } from './huff-options.js';
import { demandCells, type DemandCells, type ScoringSurface } from './scoring-surface.js';

/**
 * Everything about today's network (own stores + competitors) that does not depend on the
 * candidate, computed once per surface: per demand cell c the base denominator
 * S_c = Σ_k A_k^α d_ck^(−β) and the own network's base share O_c = Σ_own A^α d^(−β) / S_c.
 *
 * Distances are in km between cell centres and sites. A cell centre closer to a site than half
 * a cell is taken to be half a cell away (d ≥ cellSize/2): the mean distance from a cell's
 * points to a site at its centre is ≈ 0.38 cell sizes [D], so half a cell keeps d^(−β) finite
 * and of the right size. There is no distance cut-off: Huff probabilities reach every cell.
 */
export interface HuffGrid {
  cells: DemandCells;
  /** Cell centres in km. */
  xKm: Float64Array;
  yKm: Float64Array;
  /** S_c over today's stores (0 where there are none). */
  denominator: Float64Array;
  /** W_c · O_c: demand times the own network's base share. */
  ownDemand: Float64Array;
  alpha: number;
  beta: number;
  /** (cellSize / 2)² in km². */
  minDistanceSqKm: number;
  own: readonly Site[];
  competitors: readonly Site[];
}

/**
 * Adds (or, with `into` = undefined, writes) the Huff term A^α d^(−β) of a store at (sx, sy) km
 * for every cell. β = 2 avoids powers; other β use (d²)^(−β/2) as exp(−β/2 · ln d²).
 *
 * @param grid the precomputed grid (only cells and settings are read)
 * @param site the store
 * @param out destination, one value per demand cell
 * @param add true: out += term, false: out = term
 * @returns nothing
 * @example
 * huffTermsInto(grid, site, scratch, false);
 */
export function huffTermsInto(grid: Pick<HuffGrid, 'xKm' | 'yKm' | 'alpha' | 'beta' | 'minDistanceSqKm'>, site: Site, out: Float64Array, add: boolean): void {
  const { xKm, yKm, beta, minDistanceSqKm } = grid;
  const a = Math.pow(site.attractiveness, grid.alpha);
  const sx = site.x / 1000;
  const sy = site.y / 1000;
  const n = xKm.length;
  const half = -beta / 2;
  if (!add) out.fill(0, 0, n);
  if (beta === 2) {
    for (let c = 0; c < n; c++) {
      const dx = xKm[c] - sx;
      const dy = yKm[c] - sy;
      const d2 = dx * dx + dy * dy;
      out[c] += a / (d2 < minDistanceSqKm ? minDistanceSqKm : d2);
    }
    return;
  }
  for (let c = 0; c < n; c++) {
    const dx = xKm[c] - sx;
    const dy = yKm[c] - sy;
    const d2 = dx * dx + dy * dy;
    out[c] += a * Math.exp(half * Math.log(d2 < minDistanceSqKm ? minDistanceSqKm : d2)); // faster than Math.pow in V8
  }
}

/**
 * Precomputes today's network on a surface (see {@link HuffGrid}).
 *
 * @param surface λ̂ per km² (validated by the caller)
 * @param own the chain's stores
 * @param competitors rivals' stores
 * @param options α, β
 * @param signal optional abort signal, checked between stores
 * @returns the grid ready for candidate scoring
 * @example
 * const grid = huffGrid(surface, own, competitors, { beta: 2 });
 */
export function huffGrid(
  surface: ScoringSurface,
  own: readonly Site[],
  competitors: readonly Site[],
  options: HuffOptions = {},
  signal?: AbortSignal,
): HuffGrid {
  const { alpha, beta } = huffSettings(options);
  const cells = demandCells(surface);
  const n = cells.demand.length;
  const xKm = new Float64Array(n);
  const yKm = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    xKm[c] = cells.x[c] / 1000;
    yKm[c] = cells.y[c] / 1000;
  }
  const { spec } = surface;
  const halfCellKm = spec.cellSize / 2000;
  const grid: HuffGrid = {
    cells,
    xKm,
    yKm,
    denominator: new Float64Array(n),
    ownDemand: new Float64Array(n),
    alpha,
    beta,
    minDistanceSqKm: halfCellKm * halfCellKm,
    own,
    competitors,
  };
  const ownSum = grid.ownDemand; // Σ_own terms first, turned into W·O below
  for (const s of own) {
    throwIfAborted(signal);
    huffTermsInto(grid, s, ownSum, true);
  }
  grid.denominator.set(ownSum);
  for (const s of competitors) {
    throwIfAborted(signal);
    huffTermsInto(grid, s, grid.denominator, true);
  }
  const { demand } = cells;
  for (let c = 0; c < n; c++) {
    const S = grid.denominator[c];
    ownSum[c] = S > 0 ? (demand[c] * ownSum[c]) / S : 0;
  }
  return grid;
}

/**
 * Demand each of today's stores holds before anything opens: Σ_c W_c · A_k^α d^(−β) / S_c.
 *
 * @param grid the precomputed grid
 * @param stores stores of the grid's network
 * @returns captured demand per store, in the given order
 * @example
 * huffBaseCaptured(grid, grid.own);
 */
export function huffBaseCaptured(grid: HuffGrid, stores: readonly Site[]): number[] {
  const scratch = new Float64Array(grid.cells.demand.length);
  const { demand } = grid.cells;
  return stores.map((s) => {
    huffTermsInto(grid, s, scratch, false);
    let sum = 0;
    for (let c = 0; c < scratch.length; c++) {
      const S = grid.denominator[c];
      if (S > 0) sum += (demand[c] * scratch[c]) / S;
    }
    return sum;
  });
}

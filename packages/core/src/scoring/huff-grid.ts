import { CoreError, throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import { distancePower, fourWayProductSafe, squaredDistancePower, type DistancePower } from './huff-distance-power.js';
import { huffSettings, type HuffOptions } from './huff-options.js';
import { demandCells, type DemandCells, type RowRange, type ScoringSurface } from './scoring-surface.js';

/** Options of {@link huffGrid}: α, β, the minimum distance and an optional part of the rows. */
export interface HuffGridOptions extends HuffOptions {
  /** Smallest cell–store distance in metres (guards d → 0); null or left out: half a cell. */
  minDistanceM?: number | null;
  /**
   * Only the demand cells of grid rows rowStart ≤ j < rowEnd (default every row). Every Huff sum
   * is a sum over cells, so scores of disjoint row ranges add up to the whole surface's: this
   * is how work is split across threads.
   */
  rows?: RowRange;
}

/**
 * Everything about today's network (own stores + competitors) that does not depend on the
 * candidate, computed once per surface: per demand cell c the base denominator
 * S_c = Σ_k A_k^α d_ck^(−β) and the own network's base share O_c = Σ_own A^α d^(−β) / S_c.
 *
 * Distances are in km between cell centres and sites. A cell centre closer to a site than the
 * minimum distance is taken to be that far; the default is half a cell (d ≥ cellSize/2): the
 * mean distance from a cell's points to a site at its centre is ≈ 0.38 cell sizes [D], so half a
 * cell keeps d^(−β) finite and of the right size. There is no distance cut-off: Huff
 * probabilities reach every cell.
 */
export interface HuffGrid {
  cells: DemandCells;
  /** Cell centres in km (packed like cells). */
  xKm: Float64Array;
  yKm: Float64Array;
  /** Column centres (one per grid column) and row centres (one per grid row) in km. */
  colXKm: Float64Array;
  rowYKm: Float64Array;
  /** S_c over today's stores (0 where there are none). */
  denominator: Float64Array;
  /** Largest S_c (0 without stores). */
  denominatorMax: number;
  /** W_c · O_c: demand times the own network's base share. */
  ownDemand: Float64Array;
  alpha: number;
  beta: number;
  power: DistancePower;
  /** (minimum distance)² in km². */
  minDistanceSqKm: number;
  /** Bounding box of the cell centres in km: [xMin, yMin, xMax, yMax]. */
  boxKm: readonly [number, number, number, number];
  own: readonly Site[];
  competitors: readonly Site[];
}

type TermGrid = Pick<HuffGrid, 'xKm' | 'yKm' | 'alpha' | 'beta' | 'minDistanceSqKm'> & { power?: DistancePower };

/**
 * Adds (or, with add = false, writes) the Huff term A^α d^(−β) of a store at (sx, sy) km for
 * every packed cell, one division a cell (see huff-distance-power.ts for d^β).
 *
 * @param grid the precomputed grid (only cells and settings are read)
 * @param site the store
 * @param out destination, one value per demand cell
 * @param add true: out += term, false: out = term
 * @returns nothing
 * @example
 * huffTermsInto(grid, site, scratch, false);
 */
export function huffTermsInto(grid: TermGrid, site: Site, out: Float64Array, add: boolean): void {
  const { xKm, yKm, beta, minDistanceSqKm } = grid;
  const { whole, quarters, halfBeta } = grid.power ?? distancePower(beta);
  const a = Math.pow(site.attractiveness, grid.alpha);
  const sx = site.x / 1000;
  const sy = site.y / 1000;
  const n = xKm.length;
  if (!add) out.fill(0, 0, n);
  for (let c = 0; c < n; c++) {
    const dx = xKm[c] - sx;
    const dy = yKm[c] - sy;
    const e = Math.max(minDistanceSqKm, dx * dx + dy * dy);
    out[c] += beta === 2 ? a / e : a / (quarters < 0 ? Math.exp(halfBeta * Math.log(e)) : squaredDistancePower(e, whole, quarters, halfBeta));
  }
}

/**
 * Largest squared distance (km²) from a point to the box [x0, y0, x1, y1].
 *
 * @param box the box in km
 * @param x point x in km
 * @param y point y in km
 * @returns the squared distance to the farthest corner
 * @example
 * boxFarthestSq([0, 0, 3, 4], 0, 0); // 25
 */
export function boxFarthestSq(box: readonly [number, number, number, number], x: number, y: number): number {
  const dx = Math.max(Math.abs(x - box[0]), Math.abs(x - box[2]));
  const dy = Math.max(Math.abs(y - box[1]), Math.abs(y - box[3]));
  return dx * dx + dy * dy;
}

/**
 * Adds a store's terms to one run of cells (row dy² fixed). For β = 2 and rows at least the
 * minimum distance away, four cells share one division (1/e₁ = e₂e₃e₄/(e₁e₂e₃e₄)).
 */
function runTermsAdd(
  out: Float64Array,
  p: number,
  colX: Float64Array,
  i0: number,
  i1: number,
  dy2: number,
  sx: number,
  a: number,
  g: { minD: number; beta: number; pw: DistancePower; fourWay: boolean },
): void {
  const { minD, beta } = g;
  let i = i0;
  if (beta === 2 && g.fourWay && dy2 >= minD) {
    for (; i + 3 < i1; i += 4, p += 4) {
      const u1 = colX[i] - sx;
      const u2 = colX[i + 1] - sx;
      const u3 = colX[i + 2] - sx;
      const u4 = colX[i + 3] - sx;
      const e1 = u1 * u1 + dy2;
      const e2 = u2 * u2 + dy2;
      const e3 = u3 * u3 + dy2;
      const e4 = u4 * u4 + dy2;
      const p12 = e1 * e2;
      const p34 = e3 * e4;
      const r = a / (p12 * p34);
      const r12 = p34 * r;
      const r34 = p12 * r;
      out[p] += e2 * r12;
      out[p + 1] += e1 * r12;
      out[p + 2] += e4 * r34;
      out[p + 3] += e3 * r34;
    }
  }
  const { whole, quarters, halfBeta } = g.pw;
  for (; i < i1; i++, p++) {
    const u = colX[i] - sx;
    const e = Math.max(minD, u * u + dy2);
    out[p] += beta === 2 ? a / e : a / (quarters < 0 ? Math.exp(halfBeta * Math.log(e)) : squaredDistancePower(e, whole, quarters, halfBeta));
  }
}

/**
 * Precomputes today's network on a surface (see {@link HuffGrid}), run by run so each row's
 * sums stay in cache while every store is added.
 *
 * @param surface λ̂ per km² (validated by the caller)
 * @param own the chain's stores
 * @param competitors rivals' stores
 * @param options α, β, minimum distance, row range
 * @param signal optional abort signal, checked between rows
 * @returns the grid ready for candidate scoring
 * @example
 * const grid = huffGrid(surface, own, competitors, { beta: 2 });
 */
export function huffGrid(
  surface: ScoringSurface,
  own: readonly Site[],
  competitors: readonly Site[],
  options: HuffGridOptions = {},
  signal?: AbortSignal,
): HuffGrid {
  const { alpha, beta } = huffSettings(options);
  const { spec } = surface;
  const minM = options.minDistanceM ?? spec.cellSize / 2;
  if (typeof minM !== 'number' || !(minM > 0) || !Number.isFinite(minM)) {
    throw new CoreError('INVALID_ARGUMENT', `minimum distance must be a positive number of metres (got ${minM}); leave it out for half a cell`, 'minDistanceM');
  }
  const cells = demandCells(surface, options.rows);
  const n = cells.demand.length;
  const xKm = new Float64Array(n);
  const yKm = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    xKm[c] = cells.x[c] / 1000;
    yKm[c] = cells.y[c] / 1000;
  }
  const colXKm = Float64Array.from({ length: spec.width }, (_, i) => (spec.originX + (i + 0.5) * spec.cellSize) / 1000);
  const rowYKm = Float64Array.from({ length: spec.height }, (_, j) => (spec.originY + (j + 0.5) * spec.cellSize) / 1000);
  const minD = (minM / 1000) ** 2;
  const boxKm = [colXKm[0], rowYKm[cells.rowStart] ?? 0, colXKm[spec.width - 1], rowYKm[Math.max(cells.rowStart, cells.rowEnd - 1)] ?? 0] as const;
  const power = distancePower(beta);
  const denominator = new Float64Array(n);
  const ownDemand = new Float64Array(n);
  const stores = [...own, ...competitors];
  const sa = Float64Array.from(stores, (s) => Math.pow(s.attractiveness, alpha));
  const sx = Float64Array.from(stores, (s) => s.x / 1000);
  const sy = Float64Array.from(stores, (s) => s.y / 1000);
  let aLo = Infinity;
  let aHi = 0;
  let eHi = minD;
  for (let k = 0; k < stores.length; k++) {
    aLo = Math.min(aLo, sa[k]);
    aHi = Math.max(aHi, sa[k]);
    eHi = Math.max(eHi, boxFarthestSq(boxKm, sx[k], sy[k]));
  }
  const g = { minD, beta, pw: power, fourWay: stores.length > 0 && fourWayProductSafe(minD, eHi, aLo, aHi) };
  const { runs, demand } = cells;
  // Own stores first (their sum becomes W·O below), then competitors on top for S.
  for (let r = 0; r < runs.length; r += 4) {
    if ((r & 1023) === 0) throwIfAborted(signal);
    const j = runs[r];
    const i0 = runs[r + 1];
    const i1 = runs[r + 2];
    const p0 = runs[r + 3];
    const yj = rowYKm[j];
    for (let k = 0; k < own.length; k++) {
      const dy = yj - sy[k];
      runTermsAdd(ownDemand, p0, colXKm, i0, i1, dy * dy, sx[k], sa[k], g);
    }
    denominator.set(ownDemand.subarray(p0, p0 + i1 - i0), p0);
    for (let k = own.length; k < stores.length; k++) {
      const dy = yj - sy[k];
      runTermsAdd(denominator, p0, colXKm, i0, i1, dy * dy, sx[k], sa[k], g);
    }
  }
  let denominatorMax = 0;
  for (let c = 0; c < n; c++) {
    const S = denominator[c];
    if (S > denominatorMax) denominatorMax = S;
    ownDemand[c] = S > 0 ? (demand[c] * ownDemand[c]) / S : 0;
  }
  return {
    cells,
    xKm,
    yKm,
    colXKm,
    rowYKm,
    denominator,
    denominatorMax,
    ownDemand,
    alpha,
    beta,
    power,
    minDistanceSqKm: minD,
    boxKm,
    own,
    competitors,
  };
}

/**
 * Demand each of today's stores holds before anything opens: Σ_c W_c · A_k^α d^(−β) / S_c,
 * run by run with W/S taken once per cell.
 *
 * @param grid the precomputed grid
 * @param stores stores of the grid's network
 * @returns captured demand per store, in the given order
 * @example
 * huffBaseCaptured(grid, grid.own);
 */
export function huffBaseCaptured(grid: HuffGrid, stores: readonly Site[]): number[] {
  const { denominator, colXKm, rowYKm, minDistanceSqKm: minD, beta, power } = grid;
  const { demand, runs } = grid.cells;
  const n = demand.length;
  const perS = new Float64Array(n);
  for (let c = 0; c < n; c++) perS[c] = denominator[c] > 0 ? demand[c] / denominator[c] : 0;
  const sa = stores.map((s) => Math.pow(s.attractiveness, grid.alpha));
  let eHi = minD;
  for (const s of stores) eHi = Math.max(eHi, boxFarthestSq(grid.boxKm, s.x / 1000, s.y / 1000));
  const g = { minD, beta, pw: power, fourWay: stores.length > 0 && fourWayProductSafe(minD, eHi, Math.min(...sa), Math.max(...sa)) };
  const row = new Float64Array(colXKm.length);
  return stores.map((s, k) => {
    const sx = s.x / 1000;
    const sy = s.y / 1000;
    let sum = 0;
    for (let r = 0; r < runs.length; r += 4) {
      const i0 = runs[r + 1];
      const i1 = runs[r + 2];
      const p0 = runs[r + 3];
      const dy = rowYKm[runs[r]] - sy;
      row.fill(0, 0, i1 - i0);
      runTermsAdd(row, 0, colXKm, i0, i1, dy * dy, sx, sa[k], g);
      for (let i = 0, e = i1 - i0; i < e; i++) sum += row[i] * perS[p0 + i];
    }
    return sum;
  });
}

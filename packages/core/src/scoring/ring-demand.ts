import { CoreError } from '../errors.js';
import type { ScoringSurface } from './scoring-surface.js';

/** International mile in metres (NIST SP 811, exact). */
export const METRES_PER_MILE = 1609.344;

/** Ring radii used when none are given: 1, 3 and 5 km. */
export const RING_RADII_DEFAULT_M: readonly number[] = [1000, 3000, 5000];

/**
 * Converts miles to metres.
 *
 * @param miles a distance in international miles
 * @returns the distance in metres
 * @example
 * ringRadiusFromMiles(3); // 4828.032
 */
export function ringRadiusFromMiles(miles: number): number {
  return miles * METRES_PER_MILE;
}

/**
 * A row strip's part of the disc, for the disc centred at the origin: ys' = ys − y and
 * yn' = yn − y its edges relative to the centre. `edge(X)` is the signed area of disc ∩ strip
 * between the centre's column and X (X relative to the centre), so a cell [x0, x1] of the
 * strip holds edge(x1 − x) − edge(x0 − x) of the disc. Each quadrant box [0, |X|] × [0, |Y|] is
 * the box where the disc covers it fully, plus the column integral of √(r² − t²) beyond
 * x* = √(r² − Y²) (antiderivative (t√(r² − t²) + r²·asin(t/r)) / 2) [D]; the integral at |X|
 * is shared by the strip's two edges and the value at x* is one per strip, so a boundary
 * cell costs one asin instead of eight for four separate quadrant boxes.
 */
class RingStrip {
  private readonly r: number;
  private readonly r2: number;
  private readonly ySouth: number;
  private readonly yNorth: number;
  private readonly xsSouth: number;
  private readonly xsNorth: number;
  private readonly primSouth: number;
  private readonly primNorth: number;

  constructor(radius: number, ySouth: number, yNorth: number) {
    this.r = radius;
    this.r2 = radius * radius;
    this.ySouth = ySouth;
    this.yNorth = yNorth;
    const ycS = Math.min(Math.abs(ySouth), radius);
    const ycN = Math.min(Math.abs(yNorth), radius);
    this.xsSouth = Math.sqrt(this.r2 - ycS * ycS);
    this.xsNorth = Math.sqrt(this.r2 - ycN * ycN);
    this.primSouth = this.prim(this.xsSouth);
    this.primNorth = this.prim(this.xsNorth);
  }

  private prim(t: number): number {
    return 0.5 * (t * Math.sqrt(Math.max(0, this.r2 - t * t)) + this.r2 * Math.asin(Math.min(1, t / this.r)));
  }

  /** Quadrant box [0, xc] × [0, |y|] ∩ disc, with prim(xc) passed in (NaN: not computed yet). */
  private quadrant(xc: number, pc: number, y: number, xs: number, pxs: number): number {
    const yc = Math.min(Math.abs(y), this.r);
    if (xc * xc + yc * yc <= this.r2) return xc * yc;
    return yc * xs + (Number.isNaN(pc) ? this.prim(xc) : pc) - pxs;
  }

  edge(x: number): number {
    const xc = Math.min(Math.abs(x), this.r);
    // prim(xc) is needed when the box pokes out of the disc; the north and south boxes share it.
    const pc = xc > Math.min(this.xsNorth, this.xsSouth) ? this.prim(xc) : NaN;
    const north = Math.sign(this.yNorth) * this.quadrant(xc, pc, this.yNorth, this.xsNorth, this.primNorth);
    const south = Math.sign(this.ySouth) * this.quadrant(xc, pc, this.ySouth, this.xsSouth, this.primSouth);
    return Math.sign(x) * (north - south);
  }
}

/**
 * Demand inside a ring (disc) of radius r around (x, y): ∫ λ̂ over the disc, with each cell's
 * value weighted by the exact area of the cell ∩ disc (not cell-centre counting), so the result
 * moves smoothly with the radius. λ̂ is taken constant over a cell. Demand outside the grid is 0.
 *
 * @param surface λ̂ per km² on its grid
 * @param x centre x in metres (the surface's projection)
 * @param y centre y in metres
 * @param radius ring radius in metres (> 0)
 * @returns demand in the weight's unit (customers, spend, …)
 * @example
 * ringDemand(surface, site.x, site.y, 3000);
 */
export function ringDemand(surface: ScoringSurface, x: number, y: number, radius: number): number {
  return ringDemandRows(surface, x, y, radius, 0, surface.spec.height);
}

/**
 * The part of {@link ringDemand} that lies in grid rows rowStart ≤ j < rowEnd; the parts of
 * disjoint row ranges add up to the whole ring (for splitting work across threads).
 *
 * @param surface λ̂ per km²
 * @param x centre x in metres
 * @param y centre y in metres
 * @param radius ring radius in metres (> 0)
 * @param rowStart first grid row
 * @param rowEnd end row (exclusive)
 * @returns demand of the ring within those rows
 * @example
 * ringDemandRows(surface, x, y, 3000, 0, 500) + ringDemandRows(surface, x, y, 3000, 500, 1000);
 */
export function ringDemandRows(surface: ScoringSurface, x: number, y: number, radius: number, rowStart: number, rowEnd: number): number {
  if (!(radius > 0) || !Number.isFinite(radius)) {
    throw new CoreError('INVALID_ARGUMENT', `ring radius must be a positive number of metres (got ${radius})`, 'radii');
  }
  const { spec, values } = surface;
  const { originX, originY, cellSize, width, height } = spec;
  const i0 = Math.max(0, Math.floor((x - radius - originX) / cellSize));
  const i1 = Math.min(width - 1, Math.floor((x + radius - originX) / cellSize));
  const j0 = Math.max(0, rowStart, Math.floor((y - radius - originY) / cellSize));
  const j1 = Math.min(height - 1, rowEnd - 1, Math.floor((y + radius - originY) / cellSize));
  const r2 = radius * radius;
  const cellArea = cellSize * cellSize;
  let sum = 0; // Σ λ̂ (per km²) × area (m²)
  for (let j = j0; j <= j1; j++) {
    const ys = originY + j * cellSize;
    const yn = ys + cellSize;
    const row = j * width;
    // Cells whose four corners lie in the disc are summed whole; only the others are clipped.
    const dyFar = Math.max(Math.abs(ys - y), Math.abs(yn - y));
    const dyNear = y < ys ? ys - y : y > yn ? y - yn : 0;
    const hx = dyFar < radius ? Math.sqrt(r2 - dyFar * dyFar) : -1;
    let f0 = i1 + 1;
    let f1 = i1;
    if (hx >= 0) {
      f0 = Math.max(i0, Math.ceil((x - hx - originX) / cellSize));
      f1 = Math.min(i1, Math.floor((x + hx - originX) / cellSize) - 1);
      if (f1 < f0) {
        f0 = i1 + 1;
        f1 = i1;
      }
    }
    let inner = 0;
    for (let i = f0; i <= f1; i++) inner += values[row + i];
    sum += inner * cellArea;
    let strip: RingStrip | undefined;
    let westEdgeAt = NaN; // the last east edge computed, reused as the next cell's west edge
    let westEdge = 0;
    for (let i = i0; i <= i1; i++) {
      if (i === f0) {
        i = f1;
        continue;
      }
      const v = values[row + i];
      if (v === 0) continue;
      const xw = originX + i * cellSize;
      const dxNear = x < xw ? xw - x : x > xw + cellSize ? x - xw - cellSize : 0;
      if (dxNear * dxNear + dyNear * dyNear >= r2) continue;
      strip ??= new RingStrip(radius, ys - y, yn - y);
      const west = westEdgeAt === i ? westEdge : strip.edge(xw - x);
      westEdge = strip.edge(xw + cellSize - x);
      westEdgeAt = i + 1;
      sum += v * Math.max(0, westEdge - west);
    }
  }
  return sum / 1e6;
}

/** Demand inside one ring. */
export interface RingDemand {
  radius: number;
  demand: number;
}

/**
 * Demand inside each ring around a point.
 *
 * @param surface λ̂ per km²
 * @param x centre x in metres
 * @param y centre y in metres
 * @param radii ring radii in metres (default 1, 3, 5 km)
 * @returns one entry per radius, in the given order
 * @example
 * ringDemands(surface, 0, 0, [ringRadiusFromMiles(1), ringRadiusFromMiles(3)]);
 */
export function ringDemands(
  surface: ScoringSurface,
  x: number,
  y: number,
  radii: readonly number[] = RING_RADII_DEFAULT_M,
): RingDemand[] {
  return radii.map((radius) => ({ radius, demand: ringDemand(surface, x, y, radius) }));
}

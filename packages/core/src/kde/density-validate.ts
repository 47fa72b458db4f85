import { CoreError } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { KDE_SUGGESTED_CELL_FRACTION } from './kde-cell-rule.js';

const fmt = (v: number): string =>
  Number.isFinite(v) ? String(Math.round(v * 100) / 100) : String(v);

/**
 * A bandwidth to suggest in error messages: the normal-reference rule h = σ̂·n_eff^(−1/6) per
 * axis (Bowman & Azzalini 1997; n_eff = (Σw)²/Σw², Kish), σ̂ the weighted sd pooled over both
 * axes, scaled to the kernel by canonical bandwidths (Marron & Nolan 1988). Only a hint: the
 * bandwidth module has the full rules (robust spread, cross-validation).
 */
function bandwidthHint(points: PlanarPoints, kernel: KernelName): number {
  const { x, y, w } = points;
  let sw = 0;
  let sw2 = 0;
  let mx = 0;
  let my = 0;
  for (let k = 0; k < x.length; k++) {
    sw += w[k];
    sw2 += w[k] * w[k];
    mx += w[k] * x[k];
    my += w[k] * y[k];
  }
  mx /= sw;
  my /= sw;
  let v = 0;
  for (let k = 0; k < x.length; k++) v += w[k] * ((x[k] - mx) ** 2 + (y[k] - my) ** 2);
  const sd = Math.sqrt(v / (2 * sw));
  const nEff = (sw * sw) / sw2;
  const h =
    sd *
    Math.pow(nEff, -1 / 6) *
    (kernelByName(kernel).canonicalDelta / kernelByName('gaussian').canonicalDelta);
  return h > 0 ? h : 1000;
}

/**
 * Checks the inputs of a density surface and throws a CoreError that names the field, the rule
 * and what to do. Returns the total weight.
 *
 * @param points planar points
 * @param spec the grid
 * @param kernel kernel name
 * @param bandwidth h in metres
 * @param mask optional study-area mask
 * @returns Σw
 * @example
 * const total = densityInputValidate(points, spec, 'quartic', 850);
 */
export function densityInputValidate(
  points: PlanarPoints,
  spec: GridSpec,
  kernel: KernelName,
  bandwidth: number,
  mask?: Uint8Array,
): number {
  kernelByName(kernel);
  const { x, y, w } = points;
  if (x.length !== y.length || x.length !== w.length) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `points.x, points.y and points.w must have the same length (got ${x.length}, ${y.length}, ${w.length})`,
      'points',
    );
  }
  if (x.length === 0) {
    throw new CoreError(
      'EMPTY_POINTS',
      'there are no customer locations to smooth (got 0 points); add a customer file with valid rows',
      'points',
    );
  }
  let total = 0;
  for (let k = 0; k < x.length; k++) {
    if (!Number.isFinite(x[k]) || !Number.isFinite(y[k])) {
      const axis = Number.isFinite(x[k]) ? 'y' : 'x';
      throw new CoreError(
        'INVALID_COORDINATE',
        `point ${k} has ${axis} = ${axis === 'x' ? x[k] : y[k]}; coordinates must be finite metres — fix or remove that row`,
        `points.${axis}`,
        { index: k },
      );
    }
    if (!(w[k] >= 0) || !Number.isFinite(w[k])) {
      throw new CoreError(
        'INVALID_WEIGHT',
        `point ${k} has weight ${w[k]}; weights must be finite numbers ≥ 0 — fix the row, or use 1 for unweighted customers`,
        'points.w',
        { index: k },
      );
    }
    total += w[k];
  }
  if (!(total > 0)) {
    throw new CoreError(
      'ZERO_TOTAL_WEIGHT',
      `the weights of all ${x.length} points add up to 0; give at least one customer a positive weight (e.g. 1 each)`,
      'points.w',
    );
  }
  if (!(bandwidth > 0) || !Number.isFinite(bandwidth)) {
    const hint = bandwidthHint(points, kernel);
    throw new CoreError(
      'INVALID_BANDWIDTH',
      `bandwidth must be a positive number of metres (got ${bandwidth}); try the suggested ${Math.round(hint)} m`,
      'bandwidth',
      { suggested: hint },
    );
  }
  if (!(spec.cellSize > 0) || !Number.isFinite(spec.cellSize)) {
    const hint = KDE_SUGGESTED_CELL_FRACTION[kernel] * bandwidth;
    throw new CoreError(
      'INVALID_CELL_SIZE',
      `cell size must be a positive number of metres (got ${spec.cellSize}); for a bandwidth of ${fmt(bandwidth)} m try ${fmt(hint)} m`,
      'cellSize',
      { suggested: hint },
    );
  }
  for (const key of ['width', 'height'] as const) {
    const v = spec[key];
    if (!Number.isInteger(v) || v < 1) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `grid ${key} must be a whole number of cells ≥ 1 (got ${v})`,
        key,
      );
    }
  }
  for (const key of ['originX', 'originY'] as const) {
    if (!Number.isFinite(spec[key])) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `grid ${key} must be a finite number of metres (got ${spec[key]})`,
        key,
      );
    }
  }
  if (mask) {
    const cells = spec.width * spec.height;
    if (mask.length !== cells) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `mask must have one value per cell, width × height = ${spec.width} × ${spec.height} = ${cells} (got ${mask.length}); rebuild it for this grid`,
        'mask',
      );
    }
    let inside = 0;
    for (let c = 0; c < cells; c++) if (mask[c]) inside++;
    if (inside === 0) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        'the study-area mask has no cell inside it; draw the study area over the customers or leave it out',
        'mask',
      );
    }
  }
  return total;
}

import type { PlanarPoints } from '../types.js';

/** Weighted summary of a point cloud (metres). */
export interface PointsSpread {
  /** Σw. */
  totalWeight: number;
  /** Kish's effective sample size (Σw)² / Σw². */
  nEff: number;
  meanX: number;
  meanY: number;
  /** Weighted standard deviation per axis, with the reliability-weights correction n_eff/(n_eff − 1). */
  sdX: number;
  sdY: number;
  /** Weighted interquartile range per axis (Hazen plotting positions). */
  iqrX: number;
  iqrY: number;
}

/**
 * Weighted spread of points, the inputs to the normal-reference bandwidth. The variance is
 * Σw(x − m)² / (Σw − Σw²/Σw), i.e. numpy `cov(..., aweights=w)` as used by scipy `gaussian_kde`;
 * quantiles interpolate linearly between Hazen positions (C_i − w_i/2) / Σw, which for equal
 * weights is numpy `percentile(..., method='hazen')` (Hyndman & Fan 1996, definition 5).
 * Points with zero weight do not count.
 *
 * @param points planar points (metres), total weight > 0
 * @returns weights, Kish n_eff, means, sds and IQRs per axis
 * @example
 * pointsSpread(points).nEff; // 10,000 for 10,000 unit weights
 */
export function pointsSpread(points: PlanarPoints): PointsSpread {
  const { x, y, w } = points;
  const n = x.length;
  let sw = 0;
  let sw2 = 0;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    const wi = w[i];
    sw += wi;
    sw2 += wi * wi;
    sx += wi * x[i];
    sy += wi * y[i];
  }
  const meanX = sx / sw;
  const meanY = sy / sw;
  let vx = 0;
  let vy = 0;
  for (let i = 0; i < n; i++) {
    vx += w[i] * (x[i] - meanX) ** 2;
    vy += w[i] * (y[i] - meanY) ** 2;
  }
  const denom = sw - sw2 / sw;
  const sdX = denom > 0 ? Math.sqrt(vx / denom) : 0;
  const sdY = denom > 0 ? Math.sqrt(vy / denom) : 0;
  return {
    totalWeight: sw,
    nEff: (sw * sw) / sw2,
    meanX,
    meanY,
    sdX,
    sdY,
    iqrX: weightedIqr(x, w),
    iqrY: weightedIqr(y, w),
  };
}

/** Weighted IQR from one sort; equal weights take the native numeric sort. */
function weightedIqr(v: Float64Array, w: Float64Array): number {
  let equal = true;
  const w0 = w[0];
  for (let i = 1; i < w.length && equal; i++) equal = w[i] === w0;
  if (equal) {
    const sorted = v.slice().sort();
    const ones = new Float64Array(sorted.length).fill(1);
    const all = Uint32Array.from({ length: sorted.length }, (_, i) => i);
    return weightedQuantile(sorted, ones, all, 0.75) - weightedQuantile(sorted, ones, all, 0.25);
  }
  let m = 0;
  for (let i = 0; i < v.length; i++) if (w[i] > 0) m++;
  const idx = new Uint32Array(m);
  m = 0;
  for (let i = 0; i < v.length; i++) if (w[i] > 0) idx[m++] = i;
  idx.sort((a, b) => v[a] - v[b]);
  return weightedQuantile(v, w, idx, 0.75) - weightedQuantile(v, w, idx, 0.25);
}

/** Weighted quantile with Hazen positions over indices `idx` sorted by value (positive weights only). */
function weightedQuantile(v: Float64Array, w: Float64Array, idx: Uint32Array, q: number): number {
  let total = 0;
  for (const i of idx) total += w[i];
  const target = q * total;
  let cum = 0;
  let prevPos = -Infinity;
  let prevVal = v[idx[0]];
  for (const i of idx) {
    const pos = cum + w[i] / 2;
    if (pos >= target) {
      if (prevPos === -Infinity) return v[i];
      return prevVal + ((target - prevPos) / (pos - prevPos)) * (v[i] - prevVal);
    }
    cum += w[i];
    prevPos = pos;
    prevVal = v[i];
  }
  return prevVal;
}

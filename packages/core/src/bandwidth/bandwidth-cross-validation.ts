import { CoreError } from '../errors.js';
import { kernelBandwidthConvert, kernelByName, kernelSd } from '../kernels/kernels.js';
import { formatMetres, formatNumber } from '../lib/format-number.js';
import { goldenSectionMinimize } from '../lib/golden-section.js';
import { kernelSelfConvolution } from '../lib/kernel-self-convolution.js';
import { randomSampleIndices } from '../lib/random-sample-indices.js';
import { randomSeeded } from '../lib/random-seeded.js';
import { pointsMergeCoincident } from '../points/points-merge-coincident.js';
import type { KernelName, PlanarPoints } from '../types.js';
import { cvLeastSquaresScore, cvLikelihoodScore } from './bandwidth-cv-criteria.js';
import { bandwidthNormalReference } from './bandwidth-normal-reference.js';
import type { BandwidthResult } from './bandwidth-result.js';

/** Options for {@link bandwidthCrossValidation}. */
export interface CrossValidationOptions {
  /** 'likelihood' (Loader 1999) or 'least-squares' (Rudemo 1982; Bowman 1984). Default 'likelihood'. */
  method?: 'likelihood' | 'least-squares';
  /** Most distinct locations used (default 2,000, at most 4,000); larger inputs are subsampled. */
  maxSample?: number;
  /** Seed of the subsample (default 1). */
  seed?: number;
  /** Number of log-spaced trial bandwidths before refining (default 40). */
  steps?: number;
  /** Search range as multiples of the normal-reference bandwidth (default [0.05, 3]). */
  range?: [number, number];
}

const MAX_SAMPLE_LIMIT = 4000;

/**
 * A cross-validated bandwidth. Coincident points are merged first (their weights added), because
 * duplicates drive cross-validated bandwidths towards 0. Above `maxSample` distinct locations a
 * seeded uniform subsample (weights kept) is used, and the result is scaled to the full data by
 * (n_eff,sample / n_eff,all)^{1/6}, the rate of the AMISE-optimal bandwidth in 2-D [D]. The
 * criterion is evaluated on 40 log-spaced bandwidths from 0.05× to 3× the normal-reference value,
 * then refined by golden-section search between the best one's neighbours (in log h).
 *
 * Likelihood leaves out locations with no neighbour within the Gaussian reach of the largest
 * trial bandwidth (their leave-one-out intensity is 0 for every bandwidth searched).
 *
 * Kernels: least squares uses the requested kernel (its self-convolution for ∫ f̂²). Likelihood is
 * computed with the Gaussian and converted by canonical scaling, because with a compact kernel the
 * leave-one-out likelihood is −∞ whenever any customer has no neighbour within h, so one remote
 * customer would dictate the bandwidth.
 *
 * @param points planar points (metres), positive total weight, at least 3 distinct locations
 * @param kernel kernel name
 * @param options method, maxSample, seed, steps, range
 * @returns `{ value, rule, explanation, gaussianSd, kernelSd, searchEdge? }`
 * @throws CoreError INVALID_ARGUMENT (too few distinct locations, bad options)
 * @example
 * bandwidthCrossValidation(points, 'quartic', { method: 'least-squares', seed: 7 }).value;
 */
export function bandwidthCrossValidation(
  points: PlanarPoints,
  kernel: KernelName,
  options: CrossValidationOptions = {},
): BandwidthResult {
  const k = kernelByName(kernel);
  const method = options.method ?? 'likelihood';
  if (method !== 'likelihood' && method !== 'least-squares') {
    throw new CoreError('INVALID_ARGUMENT', `method must be 'likelihood' or 'least-squares' (got "${String(method)}")`, 'method');
  }
  const maxSample = options.maxSample ?? 2000;
  if (!Number.isInteger(maxSample) || maxSample < 10 || maxSample > MAX_SAMPLE_LIMIT) {
    throw new CoreError('INVALID_ARGUMENT', `maxSample must be a whole number from 10 to ${MAX_SAMPLE_LIMIT} (got ${maxSample})`, 'maxSample');
  }
  const steps = options.steps ?? 40;
  const [lo, hi] = options.range ?? [0.05, 3];
  if (!(steps >= 3 && lo > 0 && hi > lo)) {
    throw new CoreError('INVALID_ARGUMENT', `steps must be ≥ 3 and range must satisfy 0 < low < high (got ${steps}, [${lo}, ${hi}])`, 'range');
  }
  const merged = pointsMergeCoincident(points);
  const keep: number[] = [];
  for (let i = 0; i < merged.w.length; i++) if (merged.w[i] > 0) keep.push(i);
  if (keep.length < 3) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `cross-validation needs at least 3 distinct customer locations with weight (got ${keep.length}); use the normal-reference rule or set the bandwidth by hand`,
      'points',
    );
  }
  const all = pick(merged, Uint32Array.from(keep));
  const sample = all.x.length > maxSample ? pick(all, randomSampleIndices(all.x.length, maxSample, randomSeeded(options.seed ?? 1))) : all;
  const cvKernel: KernelName = method === 'likelihood' ? 'gaussian' : kernel;
  const ck = kernelByName(cvKernel);
  const href = bandwidthNormalReference(sample, cvKernel).value;
  const hMin = lo * href;
  const hMax = hi * href;
  const reach = method === 'least-squares' ? Math.max(ck.reach, kernelSelfConvolution(cvKernel).reach) : ck.reach;
  const likelihood = method === 'likelihood' ? cvLikelihoodScore(sample, cvKernel, 1e-3 * hMin, reach * hMax) : undefined;
  const raw = likelihood ? likelihood.score : cvLeastSquaresScore(sample, cvKernel, reach * hMax);
  // Minimise in log h; −∞ likelihoods become +∞ costs.
  const cost = (t: number): number => {
    const v = raw(Math.exp(t));
    const c = method === 'likelihood' ? -v : v;
    return Number.isNaN(c) ? Infinity : c;
  };
  const t0 = Math.log(hMin);
  const dt = (Math.log(hMax) - t0) / (steps - 1);
  let best = 0;
  let bestCost = Infinity;
  for (let s = 0; s < steps; s++) {
    const c = cost(t0 + s * dt);
    if (c < bestCost) {
      bestCost = c;
      best = s;
    }
  }
  if (bestCost === Infinity) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      'cross-validation found no usable bandwidth (every trial left some customer with no neighbour); use the normal-reference rule or set the bandwidth by hand',
      'points',
    );
  }
  // 1e-3 in log h is a 0.1 % bandwidth step, far finer than the criterion's sampling noise.
  const tBest = goldenSectionMinimize(cost, t0 + Math.max(0, best - 1) * dt, t0 + Math.min(steps - 1, best + 1) * dt, 1e-3);
  const hSample = Math.exp(cost(tBest) <= bestCost ? tBest : t0 + best * dt);
  const nEffSample = kishNEff(sample.w);
  const nEffAll = kishNEff(all.w);
  const scaled = hSample * Math.pow(nEffSample / nEffAll, 1 / 6);
  const value = cvKernel === kernel ? scaled : kernelBandwidthConvert(scaled, cvKernel, kernel);
  const searchEdge = best === 0 ? 'lower' : best === steps - 1 ? 'upper' : undefined;
  const what = k.compact ? `${formatMetres(value)} radius` : `${formatMetres(value)} standard deviation`;
  const how = method === 'likelihood' ? 'likelihood cross-validation (leave-one-out, Gaussian, converted by canonical scaling)' : 'least-squares cross-validation';
  const parts = [`${what} from ${how}`];
  if (merged.x.length < points.x.length) parts.push(`${formatNumber(points.x.length - merged.x.length)} coincident points merged`);
  const isolated = likelihood ? likelihood.isolated : 0;
  if (isolated > 0) parts.push(`${formatNumber(isolated)} remote location(s) with no neighbour within ${formatMetres(reach * hMax)} left out`);
  if (sample !== all) parts.push(`${formatNumber(sample.x.length)} of ${formatNumber(all.x.length)} locations sampled, scaled by n^(−1/6)`);
  if (searchEdge) parts.push(`the best value was at the ${searchEdge} end of the search (${lo}× to ${hi}× Silverman's rule), so treat it with care`);
  return {
    value,
    kernel,
    rule: method === 'likelihood' ? 'likelihood-cv' : 'least-squares-cv',
    explanation: parts.join('; '),
    gaussianSd: kernelBandwidthConvert(value, kernel, 'gaussian'),
    kernelSd: kernelSd(kernel, value),
    ...(searchEdge ? { searchEdge } : {}),
  };
}

function pick(p: PlanarPoints, idx: Uint32Array): PlanarPoints {
  const n = idx.length;
  const out = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  for (let k = 0; k < n; k++) {
    out.x[k] = p.x[idx[k]];
    out.y[k] = p.y[idx[k]];
    out.w[k] = p.w[idx[k]];
  }
  return out;
}

/** Kish's effective sample size (Σw)² / Σw². */
function kishNEff(w: Float64Array): number {
  let s = 0;
  let s2 = 0;
  for (let i = 0; i < w.length; i++) {
    s += w[i];
    s2 += w[i] * w[i];
  }
  return (s * s) / s2;
}

import { CoreError } from '../errors.js';
import { kernelBandwidthConvert, kernelByName, kernelSd } from '../kernels/kernels.js';
import { formatMetres, formatNumber } from '../lib/format-number.js';
import { pointsSpread } from '../points/points-spread.js';
import type { KernelName, PlanarPoints } from '../types.js';
import type { BandwidthResult } from './bandwidth-result.js';

/** IQR of the standard normal, 2·Φ⁻¹(0.75) = 1.34898 (Silverman 1986, §3.4.2). */
const NORMAL_IQR = 1.349;

/**
 * The normal-reference bandwidth (Silverman's rule; in 2-D it coincides with Scott's):
 * Gaussian h = σ̂·n_eff^(−1/6), σ̂ = min(sd, IQR/1.349) per axis (Silverman 1986; statsmodels
 * `bw_silverman`), pooled isotropically as √((σ̂x² + σ̂y²)/2) [common practice], n_eff = (Σw)²/Σw²
 * (Kish). The Gaussian sd is converted to the requested kernel by canonical scaling. With equal
 * weights and sd < IQR/1.349 this is scipy `gaussian_kde(bw_method='scott')`: factor n^(−1/6)
 * times the data sd.
 *
 * @param points planar points (metres) with positive total weight
 * @param kernel kernel name
 * @returns `{ value, rule, explanation, gaussianSd, kernelSd }`
 * @throws CoreError INVALID_ARGUMENT when all points share one location (no spread to measure)
 * @example
 * bandwidthNormalReference(points, 'quartic').value; // e.g. 599 m for σ̂ = 1 km, n = 10,000
 */
export function bandwidthNormalReference(points: PlanarPoints, kernel: KernelName): BandwidthResult {
  const k = kernelByName(kernel);
  if (points.x.length === 0) throw new CoreError('EMPTY_POINTS', 'there are no points to choose a bandwidth from', 'points');
  const s = pointsSpread(points);
  if (!(s.totalWeight > 0)) throw new CoreError('ZERO_TOTAL_WEIGHT', 'all weights are zero, so there is no spread to measure', 'points');
  const robust = (sd: number, iqr: number): number => (iqr > 0 ? Math.min(sd, iqr / NORMAL_IQR) : sd);
  const sx = robust(s.sdX, s.iqrX);
  const sy = robust(s.sdY, s.iqrY);
  const sigma = Math.sqrt((sx * sx + sy * sy) / 2);
  if (!(sigma > 0)) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      'all customer points are at one location, so their spread is zero and no bandwidth follows from the data; set the bandwidth by hand',
      'points',
    );
  }
  const gaussianSd = sigma * Math.pow(s.nEff, -1 / 6);
  const value = kernelBandwidthConvert(gaussianSd, 'gaussian', kernel);
  const what = k.compact ? `${formatMetres(value)} radius` : `${formatMetres(value)} standard deviation`;
  return {
    value,
    kernel,
    rule: 'normal-reference',
    explanation: `${what} from Silverman's rule: the customers' spread (${formatMetres(sigma)}) times n^(−1/6) for ${formatNumber(s.nEff)} effective customers — best when demand forms one broad cluster; it over-smooths several tight ones`,
    gaussianSd,
    kernelSd: kernelSd(kernel, value),
  };
}

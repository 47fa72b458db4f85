import { CoreError } from '../errors.js';
import { huffSettings, type HuffOptions } from './huff-options.js';

/**
 * Huff model choice probabilities for one origin (Huff 1963, "A probabilistic analysis of
 * shopping center trade areas", Land Economics 39(1):81–90):
 * P_j = A_j^α d_j^(−β) / Σ_k A_k^α d_k^(−β).
 *
 * @param attractiveness A_j per store (> 0)
 * @param distancesKm d_j per store in km (> 0; units cancel, but keep one unit for all)
 * @param options α (default 1) and β (default 2)
 * @returns P_j per store, summing to 1
 * @example
 * huffProbabilities([3500, 1500, 300], [4, 5, 3], { beta: 1 }); // ≈ [0.6863, 0.2353, 0.0784]
 */
export function huffProbabilities(
  attractiveness: readonly number[],
  distancesKm: readonly number[],
  options: HuffOptions = {},
): number[] {
  const { alpha, beta } = huffSettings(options);
  if (attractiveness.length !== distancesKm.length || attractiveness.length === 0) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `give one distance per store (got ${attractiveness.length} attractiveness values and ${distancesKm.length} distances)`,
      'distancesKm',
    );
  }
  const terms = attractiveness.map((a, k) => {
    const d = distancesKm[k];
    if (!(a > 0) || !Number.isFinite(a)) {
      throw new CoreError('INVALID_ARGUMENT', `attractiveness of store #${k + 1} must be a positive number (got ${a})`, 'attractiveness');
    }
    if (!(d > 0) || !Number.isFinite(d)) {
      throw new CoreError('INVALID_ARGUMENT', `distance to store #${k + 1} must be a positive number of km (got ${d})`, 'distancesKm');
    }
    return Math.pow(a, alpha) * Math.pow(d, -beta);
  });
  const sum = terms.reduce((s, t) => s + t, 0);
  return terms.map((t) => t / sum);
}

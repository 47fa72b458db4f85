import { CoreError } from '../errors.js';

/**
 * Kendall's rank correlation τ-b between two paired lists (Kendall 1945, "The treatment of ties
 * in ranking problems", Biometrika 33(3):239–251):
 * τ_b = (n_c − n_d) / √((n₀ − n₁)(n₀ − n₂)), n₀ = n(n − 1)/2, n₁ and n₂ the pairs tied in the
 * first and in the second list. A pair tied in both counts in neither n₁ − … nor the numerator.
 * Without ties it is Kendall's τ-a. O(n²) pairs: fine for the few hundred to few thousand sites
 * of a study. Same definition as scipy.stats.kendalltau (variant 'b').
 *
 * @param a values or ranks per item
 * @param b values or ranks for the same items, same order
 * @returns τ-b in [−1, 1]; NaN when either list is entirely tied (τ-b is undefined then)
 * @example
 * kendallTau([1, 2, 3, 4], [1, 3, 2, 4]); // 0.6667
 */
export function kendallTau(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const n = a.length;
  if (n !== b.length) {
    throw new CoreError('INVALID_ARGUMENT', `both rankings must list the same items (got ${n} and ${b.length} values)`, 'b');
  }
  if (n < 2) {
    throw new CoreError('INVALID_ARGUMENT', `Kendall's τ needs at least 2 items (got ${n})`, 'a');
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(a[i]) || !Number.isFinite(b[i])) {
      throw new CoreError('INVALID_ARGUMENT', `ranking values must be finite numbers (item #${i + 1}: ${a[i]}, ${b[i]})`, 'a');
    }
  }
  let s = 0;
  let tiesA = 0;
  let tiesB = 0;
  for (let i = 0; i < n - 1; i++) {
    for (let j = i + 1; j < n; j++) {
      const da = Math.sign(a[i] - a[j]);
      const db = Math.sign(b[i] - b[j]);
      if (da === 0) tiesA++;
      if (db === 0) tiesB++;
      s += da * db;
    }
  }
  const n0 = (n * (n - 1)) / 2;
  const denom = Math.sqrt((n0 - tiesA) * (n0 - tiesB));
  return denom === 0 ? NaN : s / denom;
}

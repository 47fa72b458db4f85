import type { RandomSeeded } from './random-seeded.js';

/**
 * Chooses k distinct indices out of n, in increasing order (partial Fisher–Yates shuffle), so a
 * subsample is reproducible from its seed.
 *
 * @param n population size
 * @param k how many to choose (0 ≤ k ≤ n)
 * @param rng a seeded generator ({@link randomSeeded})
 * @returns the chosen indices, sorted ascending
 * @example
 * randomSampleIndices(10, 3, randomSeeded(1)); // e.g. Uint32Array [1, 4, 8]
 */
export function randomSampleIndices(n: number, k: number, rng: RandomSeeded): Uint32Array {
  const perm = new Uint32Array(n);
  for (let i = 0; i < n; i++) perm[i] = i;
  for (let i = 0; i < k; i++) {
    const j = i + Math.floor(rng.uniform() * (n - i));
    const t = perm[i];
    perm[i] = perm[j];
    perm[j] = t;
  }
  return perm.slice(0, k).sort();
}

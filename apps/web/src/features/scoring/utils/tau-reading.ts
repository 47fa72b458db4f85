/**
 * Kendall's τ between two rankings in plain words (1 = the same order, 0 = unrelated, −1 = reversed).
 * @param tau τ-b, −1 … 1
 * @returns one short sentence
 * @example tauReading(0.95) // 'nearly the same order'
 */
export function tauReading(tau: number): string {
  if (!Number.isFinite(tau)) return 'not comparable (too few candidates)';
  if (tau >= 0.999) return 'the same order';
  if (tau >= 0.9) return 'nearly the same order';
  if (tau >= 0.7) return 'mostly the same order, a few swaps';
  if (tau >= 0.4) return 'partly reordered';
  if (tau > -0.4) return 'largely reordered';
  return 'mostly reversed';
}

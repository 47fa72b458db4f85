import { CoreError } from '../errors.js';

/**
 * Huff model settings. α weighs attractiveness, β the distance decay. Defaults α = 1, β = 2
 * (the R package MCI's defaults [S]); Huff's own survey fits were about 2.7–3.2 for furniture
 * and clothing [M]; convenience goods want a larger β than specialty goods (Huff 2003 [S]).
 */
export interface HuffOptions {
  /** Attractiveness exponent α ≥ 0 (default 1). */
  alpha?: number;
  /** Distance-decay exponent β > 0 (default 2). */
  beta?: number;
}

export interface HuffSettings {
  alpha: number;
  beta: number;
}

export const HUFF_ALPHA_DEFAULT = 1;
export const HUFF_BETA_DEFAULT = 2;

/**
 * Fills in the defaults and checks α and β.
 *
 * @param options α and β, either may be left out
 * @returns both values
 * @example
 * huffSettings({ beta: 1.5 }); // { alpha: 1, beta: 1.5 }
 */
export function huffSettings(options: HuffOptions = {}): HuffSettings {
  const alpha = options.alpha ?? HUFF_ALPHA_DEFAULT;
  const beta = options.beta ?? HUFF_BETA_DEFAULT;
  if (typeof alpha !== 'number' || !Number.isFinite(alpha) || alpha < 0) {
    throw new CoreError('INVALID_ARGUMENT', `Huff α (attractiveness exponent) must be a finite number ≥ 0 (got ${alpha}); 1 is the usual start`, 'alpha');
  }
  if (typeof beta !== 'number' || !Number.isFinite(beta) || beta <= 0) {
    throw new CoreError('INVALID_ARGUMENT', `Huff β (distance decay) must be a finite number > 0 (got ${beta}); 2 is the usual start`, 'beta');
  }
  return { alpha, beta };
}

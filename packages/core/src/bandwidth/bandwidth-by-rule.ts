import { CoreError } from '../errors.js';
import type { KernelName, PlanarPoints } from '../types.js';
import { bandwidthCrossValidation, type CrossValidationOptions } from './bandwidth-cross-validation.js';
import { bandwidthNormalReference } from './bandwidth-normal-reference.js';
import type { BandwidthResult, BandwidthRule } from './bandwidth-result.js';

/** Rules in the order the UI lists them. */
export const BANDWIDTH_RULES: readonly BandwidthRule[] = ['normal-reference', 'likelihood-cv', 'least-squares-cv'];

/**
 * A bandwidth by the named rule.
 *
 * @param points planar points (metres)
 * @param kernel kernel name
 * @param rule 'normal-reference' | 'likelihood-cv' | 'least-squares-cv'
 * @param options cross-validation options (`maxSample`, `seed`, …); ignored by the normal reference
 * @returns `{ value, rule, explanation, gaussianSd, kernelSd }`
 * @throws CoreError INVALID_ARGUMENT for an unknown rule
 * @example
 * bandwidthByRule(points, 'quartic', 'least-squares-cv', { seed: 3 });
 */
export function bandwidthByRule(
  points: PlanarPoints,
  kernel: KernelName,
  rule: BandwidthRule,
  options: Omit<CrossValidationOptions, 'method'> = {},
): BandwidthResult {
  switch (rule) {
    case 'normal-reference':
      return bandwidthNormalReference(points, kernel);
    case 'likelihood-cv':
      return bandwidthCrossValidation(points, kernel, { ...options, method: 'likelihood' });
    case 'least-squares-cv':
      return bandwidthCrossValidation(points, kernel, { ...options, method: 'least-squares' });
    default:
      throw new CoreError('INVALID_ARGUMENT', `rule must be one of ${BANDWIDTH_RULES.join(', ')} (got "${String(rule)}")`, 'rule');
  }
}

import type { KernelName } from '../types.js';

/** Names of the bandwidth rules the product offers. */
export type BandwidthRule = 'normal-reference' | 'likelihood-cv' | 'least-squares-cv';

/** A bandwidth chosen by a rule, with what the UI shows beside it. */
export interface BandwidthResult {
  /** Metres in the kernel's convention: support radius for compact kernels, sd for the Gaussian. */
  value: number;
  kernel: KernelName;
  rule: BandwidthRule;
  /** One plain-words line for the UI. */
  explanation: string;
  /** The equivalent Gaussian sd by canonical scaling (Marron & Nolan 1988), metres. */
  gaussianSd: number;
  /** The kernel's own standard deviation per axis, h·√μ₂, metres. */
  kernelSd: number;
  /** Cross-validation only: set when the best value lay at an end of the searched range. */
  searchEdge?: 'lower' | 'upper';
}

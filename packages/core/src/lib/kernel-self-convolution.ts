import { kernelByName } from '../kernels/kernels.js';
import type { KernelName } from '../types.js';

/**
 * The radial profile C(ρ) = (K ⊛ K)(ρ) of a 2-D kernel convolved with itself, for ∫ f̂² in
 * least-squares cross-validation: (K_h ⊛ K_h)(u) = h⁻² C(|u| / h).
 * Gaussian: C(ρ) = e^{−ρ²/4} / (4π) (the sum of two N(0, I) is N(0, 2I)) [D].
 * Uniform disc: C(ρ) = lens area / π² = (2 acos(ρ/2) − (ρ/2)√(4 − ρ²)) / π² [D].
 * Other compact kernels: tabulated once on ρ ∈ [0, 2] by a midpoint rule in polar coordinates
 * around one kernel's centre and linearly interpolated; checked against C(0) = R(K) and ∫C = 1.
 */
export interface SelfConvolution {
  /** C at ρ² (scaled squared distance). */
  valueSq(rho2: number): number;
  /** ρ beyond which C is 0 (2 for compact kernels, 6√2 for the Gaussian). */
  reach: number;
}

const TABLE_SIZE = 160;
const cache = new Map<KernelName, SelfConvolution>();

/**
 * The self-convolution profile of a kernel (built once, then cached).
 *
 * @param name kernel name
 * @returns C as a function of ρ², and its reach
 * @example
 * kernelSelfConvolution('quartic').valueSq(0); // = R(K) = 9/(5π)
 */
export function kernelSelfConvolution(name: KernelName): SelfConvolution {
  let c = cache.get(name);
  if (!c) {
    c = build(name);
    cache.set(name, c);
  }
  return c;
}

function build(name: KernelName): SelfConvolution {
  if (name === 'gaussian') {
    const reach = 6 * Math.SQRT2;
    return { reach, valueSq: (r2) => (r2 >= reach * reach ? 0 : Math.exp(-r2 / 4) / (4 * Math.PI)) };
  }
  if (name === 'uniform') {
    return {
      reach: 2,
      valueSq: (r2) => {
        if (r2 >= 4) return 0;
        const r = Math.sqrt(r2);
        return (2 * Math.acos(r / 2) - (r / 2) * Math.sqrt(4 - r2)) / (Math.PI * Math.PI);
      },
    };
  }
  const k = kernelByName(name);
  const table = new Float64Array(TABLE_SIZE + 1);
  const nr = 128;
  const nt = 128;
  for (let t = 0; t <= TABLE_SIZE; t++) {
    const rho = (2 * t) / TABLE_SIZE;
    let s = 0;
    for (let a = 0; a < nr; a++) {
      const r = (a + 0.5) / nr;
      const kr = k.valueSq(r * r) * r;
      for (let b = 0; b < nt; b++) {
        const th = ((b + 0.5) * Math.PI) / nt;
        s += kr * k.valueSq(r * r + rho * rho - 2 * r * rho * Math.cos(th));
      }
    }
    // Symmetric in θ: integrate over [0, π] and double.
    table[t] = (2 * s * Math.PI) / (nr * nt);
  }
  return {
    reach: 2,
    valueSq: (r2) => {
      if (r2 >= 4) return 0;
      const pos = (Math.sqrt(r2) / 2) * TABLE_SIZE;
      const i = Math.floor(pos);
      const f = pos - i;
      return i >= TABLE_SIZE ? table[TABLE_SIZE] : table[i] * (1 - f) + table[i + 1] * f;
    },
  };
}

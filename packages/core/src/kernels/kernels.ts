import { CoreError } from '../errors.js';
import { KERNEL_NAMES, type KernelName } from '../types.js';

/**
 * A 2-D radial kernel K(r), r = |u| / h, normalised so that ∫∫ K(|u|) du = 1 over the plane.
 * The bandwidth h is the support radius for compact kernels and the standard deviation
 * (per axis) for the Gaussian: K_h(u) = h⁻² K(|u| / h).
 *
 * Constants: ∫_disc (1 − r²)^q dA = π / (q + 1); second moments and roughness as in the
 * d-dimensional formulas of R package gplm `kernel.constants`; canonical scale
 * δ₀ = (R(K) / μ₂²)^{1/6} (Marron & Nolan 1988, "Canonical kernels for density estimation").
 */
export interface Kernel {
  readonly name: KernelName;
  /** K at scaled distance r ≥ 0 (already divided by h). */
  value(r: number): number;
  /** K from the squared scaled distance r² — avoids a square root in hot loops. */
  valueSq(r2: number): number;
  /** Radius (in units of h) beyond which K is treated as 0: 1 for compact kernels, 6 for the Gaussian. */
  readonly reach: number;
  /** True for kernels with bounded support. */
  readonly compact: boolean;
  /** Second moment per axis, μ₂ = ∫ u₁² K(|u|) du. */
  readonly mu2: number;
  /** Roughness R(K) = ∫ K(|u|)² du. */
  readonly roughness: number;
  /** Canonical scale δ₀ = (R / μ₂²)^{1/6}; h_B = h_A · δ₀(B) / δ₀(A). */
  readonly canonicalDelta: number;
  /** Share of the kernel's mass within scaled radius ρ. */
  massWithin(rho: number): number;
  /** Plain-words label for the UI. */
  readonly label: string;
}

const PI = Math.PI;

/**
 * Gaussian truncation radius in sd units. The mass beyond 6σ is e^{-18} ≈ 1.5·10⁻⁸, far below
 * the 10⁻⁴ relative tolerance the product promises.
 */
export const GAUSSIAN_REACH = 6;

function delta(roughness: number, mu2: number): number {
  return Math.pow(roughness / (mu2 * mu2), 1 / 6);
}

function polyKernel(name: KernelName, q: number, label: string): Kernel {
  // K(r) = c (1 − r²)^q on r ≤ 1 with c = (q + 1) / π.
  const c = (q + 1) / PI;
  const mu2 = 1 / (2 * (q + 2)); // ∫ r² cos²θ c(1−r²)^q r dr dθ
  const roughness = (c * c * PI) / (2 * q + 1);
  const valueSq = (r2: number): number => {
    if (r2 >= 1) return 0;
    const t = 1 - r2;
    let v = c;
    for (let k = 0; k < q; k++) v *= t;
    return v;
  };
  return {
    name,
    label,
    value: (r) => valueSq(r * r),
    valueSq,
    reach: 1,
    compact: true,
    mu2,
    roughness,
    canonicalDelta: delta(roughness, mu2),
    massWithin: (rho) => (rho >= 1 ? 1 : rho <= 0 ? 0 : 1 - Math.pow(1 - rho * rho, q + 1)),
  };
}

const gaussian: Kernel = {
  name: 'gaussian',
  label: 'Gaussian — smooth bell, never quite reaches zero; bandwidth is its standard deviation',
  value: (r) => Math.exp(-0.5 * r * r) / (2 * PI),
  valueSq: (r2) => (r2 >= GAUSSIAN_REACH * GAUSSIAN_REACH ? 0 : Math.exp(-0.5 * r2) / (2 * PI)),
  reach: GAUSSIAN_REACH,
  compact: false,
  mu2: 1,
  roughness: 1 / (4 * PI),
  canonicalDelta: delta(1 / (4 * PI), 1),
  massWithin: (rho) => (rho <= 0 ? 0 : 1 - Math.exp(-0.5 * rho * rho)),
};

const triangular: Kernel = {
  name: 'triangular',
  label: 'Triangular (cone) — falls linearly to zero at the bandwidth',
  value: (r) => (r >= 1 ? 0 : (3 / PI) * (1 - r)),
  valueSq: (r2) => (r2 >= 1 ? 0 : (3 / PI) * (1 - Math.sqrt(r2))),
  reach: 1,
  compact: true,
  mu2: 3 / 20,
  roughness: 3 / (2 * PI),
  canonicalDelta: delta(3 / (2 * PI), 3 / 20),
  massWithin: (rho) => (rho >= 1 ? 1 : rho <= 0 ? 0 : 3 * rho * rho - 2 * rho * rho * rho),
};

const KERNELS: Record<KernelName, Kernel> = {
  uniform: polyKernel('uniform', 0, 'Uniform (disc) — every customer within the bandwidth counts the same'),
  epanechnikov: polyKernel('epanechnikov', 1, 'Epanechnikov — parabolic fall-off to zero at the bandwidth'),
  quartic: polyKernel('quartic', 2, 'Quartic (biweight) — smooth fall-off to zero at the bandwidth'),
  triweight: polyKernel('triweight', 3, 'Triweight — smoother and more peaked than quartic'),
  triangular,
  gaussian,
};

/**
 * Looks up a kernel by name.
 *
 * @param name one of {@link KERNEL_NAMES}
 * @returns the kernel
 * @example
 * kernelByName('quartic').value(0); // 0.954930 (= 3/π)
 */
export function kernelByName(name: string): Kernel {
  const k = (KERNELS as Record<string, Kernel>)[name];
  if (!k) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `kernel must be one of ${KERNEL_NAMES.join(', ')} (got "${name}")`,
      'kernel',
    );
  }
  return k;
}

/**
 * Converts a bandwidth between kernels by canonical scaling (Marron & Nolan 1988):
 * h_to = h_from · δ₀(to) / δ₀(from). A Gaussian sd of 1 km is a quartic radius of ≈ 2.779 km.
 *
 * @example
 * kernelBandwidthConvert(1000, 'gaussian', 'quartic'); // ≈ 2779
 */
export function kernelBandwidthConvert(h: number, from: KernelName, to: KernelName): number {
  return (h * kernelByName(to).canonicalDelta) / kernelByName(from).canonicalDelta;
}

/**
 * The standard deviation per axis of K_h, i.e. h·√μ₂ — shown beside the radius in the UI.
 *
 * @example
 * kernelSd('quartic', 2000); // ≈ 707 m
 */
export function kernelSd(name: KernelName, h: number): number {
  return h * Math.sqrt(kernelByName(name).mu2);
}

/** The distance (metres) beyond which K_h contributes nothing: h for compact kernels, 6h for the Gaussian. */
export function kernelReach(name: KernelName, h: number): number {
  return h * kernelByName(name).reach;
}

/** Mantissas of the "nice" numbers used for cell sizes: 1, 2, 2.5 and 5 × 10^k. */
const NICE = [1, 2, 2.5, 5, 10];

/**
 * The largest nice number (1, 2, 2.5 or 5 × 10^k) not above v.
 *
 * @param v a positive number
 * @returns the nice number ≤ v
 * @example
 * niceFloor(37); // 25
 * niceFloor(0.9); // 0.5
 */
export function niceFloor(v: number): number {
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  const m = v / p;
  let best = 1;
  // 1e-9 absorbs round-off so an exact nice value maps to itself.
  for (const n of NICE) if (n <= m * (1 + 1e-9)) best = n;
  return best * p;
}

/**
 * The smallest nice number (1, 2, 2.5 or 5 × 10^k) not below v.
 *
 * @param v a positive number
 * @returns the nice number ≥ v
 * @example
 * niceCeil(37); // 50
 * niceCeil(2); // 2
 */
export function niceCeil(v: number): number {
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  const m = v / p;
  for (const n of NICE) if (n >= m * (1 - 1e-9)) return n * p;
  return 10 * p;
}

/**
 * Minimises a unimodal function on [a, b] by golden-section search (Kiefer 1953, "Sequential
 * minimax search for a maximum").
 *
 * @param f the function to minimise
 * @param a lower end
 * @param b upper end
 * @param tol stop when the bracket is narrower than tol
 * @returns the abscissa of the minimum found
 * @example
 * goldenSectionMinimize((t) => (t - 2) ** 2, 0, 5, 1e-9); // ≈ 2
 */
export function goldenSectionMinimize(f: (t: number) => number, a: number, b: number, tol: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let k = 0; k < 200 && b - a > tol; k++) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  return fc < fd ? c : d;
}

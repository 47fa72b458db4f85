/**
 * Area of the disc x² + y² ≤ r² inside the box [0, x] × [0, y] for x, y ≥ 0 (first quadrant).
 * Below the height y the disc boundary lies beyond x* = √(r² − y²); from there on the column
 * height is √(r² − X²), whose antiderivative is (X√(r² − X²) + r²·asin(X/r)) / 2.
 */
function quadrantArea(x: number, y: number, r: number): number {
  const xc = Math.min(x, r);
  const yc = Math.min(y, r);
  if (xc * xc + yc * yc <= r * r) return xc * yc;
  const xs = Math.sqrt(r * r - yc * yc);
  const prim = (t: number): number => 0.5 * (t * Math.sqrt(Math.max(0, r * r - t * t)) + r * r * Math.asin(Math.min(1, t / r)));
  return yc * xs + prim(xc) - prim(xs);
}

/** Signed quadrant area: the box from the centre to (x, y), negative across an axis. */
function signedQuadrant(x: number, y: number, r: number): number {
  const a = quadrantArea(Math.abs(x), Math.abs(y), r);
  return Math.sign(x) * Math.sign(y) * a;
}

/**
 * Exact area of the intersection of a disc with an axis-aligned rectangle, by inclusion–exclusion
 * of four signed quadrant boxes anchored at the disc's centre [D: integral of the circle's column
 * height]. Same units as the inputs (m → m²).
 *
 * @param cx disc centre x
 * @param cy disc centre y
 * @param r disc radius (≥ 0)
 * @param x0 rectangle west edge
 * @param y0 rectangle south edge
 * @param x1 rectangle east edge (≥ x0)
 * @param y1 rectangle north edge (≥ y0)
 * @returns the overlap area, 0 … min(πr², rectangle area)
 * @example
 * discRectOverlap(0, 0, 1, 0, 0, 2, 2); // π/4
 */
export function discRectOverlap(cx: number, cy: number, r: number, x0: number, y0: number, x1: number, y1: number): number {
  if (r <= 0) return 0;
  const ax = x0 - cx;
  const bx = x1 - cx;
  const ay = y0 - cy;
  const by = y1 - cy;
  const area = signedQuadrant(bx, by, r) - signedQuadrant(ax, by, r) - signedQuadrant(bx, ay, r) + signedQuadrant(ax, ay, r);
  return Math.max(0, area);
}

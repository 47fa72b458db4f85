/**
 * The run of cells of one grid row inside a point's kernel disc, shared by the exact sum and the
 * contributor counts so both decide "inside" with identical arithmetic.
 *
 * Units: fx is the point's continuous column index (cell centre i sits at fx = i), stepR the cell
 * size divided by h, dy2 the squared scaled row distance, reach2 the squared scaled reach.
 * A cell i is inside when ((i − fx)·stepR)² + dy2 < reach2; the set is contiguous because the
 * distance is convex in i. The square root gives the run; the four nudges make it exact under
 * round-off.
 *
 * @param fx point's continuous column index
 * @param stepR cell size / h
 * @param dy2 squared scaled distance of the row
 * @param reach2 squared scaled reach (already shrunk by REACH_SQ_SHRINK)
 * @param i0 first column to consider
 * @param i1 last column to consider
 * @param out receives [first, last]; first > last when the run is empty
 * @returns nothing; see `out`
 * @example
 * const run = new Int32Array(2);
 * kdeRowRun(10.3, 0.1, 0.25, 1, 0, 99, run); // run = [2, 18]
 */
export function kdeRowRun(
  fx: number,
  stepR: number,
  dy2: number,
  reach2: number,
  i0: number,
  i1: number,
  out: Int32Array,
): void {
  if (dy2 >= reach2) {
    out[0] = 1;
    out[1] = 0;
    return;
  }
  const half = Math.sqrt(reach2 - dy2) / stepR;
  let a = Math.max(i0, Math.ceil(fx - half));
  let b = Math.min(i1, Math.floor(fx + half));
  while (a <= b && rSq(a, fx, stepR, dy2) >= reach2) a++;
  while (a > i0 && rSq(a - 1, fx, stepR, dy2) < reach2) a--;
  while (b >= a && rSq(b, fx, stepR, dy2) >= reach2) b--;
  while (b >= a && b < i1 && rSq(b + 1, fx, stepR, dy2) < reach2) b++;
  out[0] = a;
  out[1] = b;
}

function rSq(i: number, fx: number, stepR: number, dy2: number): number {
  const dx = (i - fx) * stepR;
  return dx * dx + dy2;
}

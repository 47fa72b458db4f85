import type { PlanarPoints } from '../types.js';

/** Planar points after merging, with how many input points each one stands for. */
export interface MergedPoints extends PlanarPoints {
  /** Number of input points merged into each output point. */
  count: Uint32Array;
}

/**
 * Merges points with exactly the same coordinates (same address, same postcode centroid) into one
 * point carrying the summed weight. Cross-validated bandwidths collapse towards 0 when points
 * coincide, so bandwidth selection merges first. Output keeps the order of first occurrence.
 *
 * @param points planar points (metres)
 * @returns the distinct locations with summed weights and counts
 * @example
 * pointsMergeCoincident({ x: Float64Array.of(0, 0, 5), y: Float64Array.of(1, 1, 1), w: Float64Array.of(2, 3, 1) });
 * // → x [0, 5], y [1, 1], w [5, 1], count [2, 1]
 */
export function pointsMergeCoincident(points: PlanarPoints): MergedPoints {
  const n = points.x.length;
  const { x, y, w } = points;
  // Open-addressing hash table over the coordinates' bit patterns (load factor ≤ 0.5).
  let size = 16;
  while (size < 2 * n) size *= 2;
  const mask = size - 1;
  const table = new Int32Array(size).fill(-1);
  const index = new Int32Array(n);
  const first = new Int32Array(n);
  const f64 = new Float64Array(2);
  const u32 = new Uint32Array(f64.buffer);
  let m = 0;
  for (let i = 0; i < n; i++) {
    // + 0 turns -0 into 0 so both hash alike; equality below treats them as equal anyway.
    const xi = x[i] + 0;
    const yi = y[i] + 0;
    f64[0] = xi;
    f64[1] = yi;
    let h = fmix32(u32[0] ^ fmix32(u32[1] ^ fmix32(u32[2] ^ fmix32(u32[3])))) & mask;
    for (;;) {
      const s = table[h];
      if (s === -1) {
        table[h] = m;
        first[m] = i;
        index[i] = m++;
        break;
      }
      const r = first[s];
      if (x[r] === xi && y[r] === yi) {
        index[i] = s;
        break;
      }
      h = (h + 1) & mask;
    }
  }
  const out: MergedPoints = { x: new Float64Array(m), y: new Float64Array(m), w: new Float64Array(m), count: new Uint32Array(m) };
  for (let s = 0; s < m; s++) {
    out.x[s] = x[first[s]] + 0;
    out.y[s] = y[first[s]] + 0;
  }
  for (let i = 0; i < n; i++) {
    const s = index[i];
    out.w[s] += w[i];
    out.count[s]++;
  }
  return out;
}

/** MurmurHash3's 32-bit finaliser (Appleby, public domain): every input bit affects every output bit. */
function fmix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return h ^ (h >>> 16);
}

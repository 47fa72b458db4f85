import { randomSeeded } from '../src/lib/random-seeded.js';
import type { Extent, PlanarPoints } from '../src/types.js';

/**
 * Invented clustered customers for the benchmark: 12 districts (sd 0.8–4 km) holding 85 % of the
 * points, the rest scattered uniformly; weights log-normal around 100 (annual spend). Fixed seed,
 * so every run and every peer sees the same points. All points fall inside `extent`.
 *
 * @param n number of points
 * @param extent planar extent in metres
 * @param seed generator seed
 * @returns planar points with weights
 * @example
 * const pts = benchPoints(1e6, { minX: 0, minY: 0, maxX: 50_000, maxY: 50_000 });
 */
export function benchPoints(n: number, extent: Extent, seed = 20270102): PlanarPoints {
  const rng = randomSeeded(seed);
  const spanX = extent.maxX - extent.minX;
  const spanY = extent.maxY - extent.minY;
  const districts = Array.from({ length: 12 }, () => ({
    cx: extent.minX + (0.15 + 0.7 * rng.uniform()) * spanX,
    cy: extent.minY + (0.15 + 0.7 * rng.uniform()) * spanY,
    sd: 800 + 3200 * rng.uniform(),
  }));
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    let px: number;
    let py: number;
    do {
      if (rng.uniform() < 0.85) {
        const d = districts[Math.floor(rng.uniform() * districts.length)];
        px = d.cx + d.sd * rng.normal();
        py = d.cy + d.sd * rng.normal();
      } else {
        px = extent.minX + spanX * rng.uniform();
        py = extent.minY + spanY * rng.uniform();
      }
    } while (px < extent.minX || px > extent.maxX || py < extent.minY || py > extent.maxY);
    x[k] = px;
    y[k] = py;
    w[k] = 100 * Math.exp(0.8 * rng.normal());
  }
  return { x, y, w };
}

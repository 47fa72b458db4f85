import { CoreError } from '../errors.js';
import type { Extent, GridSpec, PlanarPolygon } from '../types.js';

/**
 * Checks polygons (outer ring first, then holes; rings closed or not) and returns their extent.
 *
 * @param polygons one or more polygons in planar metres
 * @returns the extent of all outer rings
 * @throws CoreError INVALID_POLYGON naming the polygon, ring and vertex
 * @example
 * polygonsExtent([[[[0, 0], [10, 0], [10, 10]]]]); // { minX: 0, minY: 0, maxX: 10, maxY: 10 }
 */
export function polygonsExtent(polygons: PlanarPolygon[]): Extent {
  const ext = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  if (polygons.length === 0) throw new CoreError('INVALID_POLYGON', 'the study area has no polygon; draw or upload one', 'polygon');
  polygons.forEach((poly, p) => {
    if (!Array.isArray(poly) || poly.length === 0) {
      throw new CoreError('INVALID_POLYGON', `polygon ${p} has no rings; give an outer ring of at least 3 points`, 'polygon', { polygon: p });
    }
    poly.forEach((ring, r) => {
      const distinct = ring.length > 1 && samePoint(ring[0], ring[ring.length - 1]) ? ring.length - 1 : ring.length;
      if (distinct < 3) {
        throw new CoreError(
          'INVALID_POLYGON',
          `polygon ${p}, ring ${r} has ${distinct} distinct point(s); a ring needs at least 3`,
          'polygon',
          { polygon: p, ring: r },
        );
      }
      ring.forEach((pt, v) => {
        if (!Array.isArray(pt) || !Number.isFinite(pt[0]) || !Number.isFinite(pt[1])) {
          throw new CoreError(
            'INVALID_POLYGON',
            `polygon ${p}, ring ${r}, point ${v} must be [x, y] with finite metres (got ${JSON.stringify(pt)})`,
            'polygon',
            { polygon: p, ring: r, vertex: v },
          );
        }
        if (r > 0) return;
        if (pt[0] < ext.minX) ext.minX = pt[0];
        if (pt[0] > ext.maxX) ext.maxX = pt[0];
        if (pt[1] < ext.minY) ext.minY = pt[1];
        if (pt[1] > ext.maxY) ext.maxY = pt[1];
      });
    });
  });
  return ext;
}

function samePoint(a: [number, number], b: [number, number]): boolean {
  return Array.isArray(a) && Array.isArray(b) && a[0] === b[0] && a[1] === b[1];
}

/**
 * Marks the cells whose centre lies inside the polygons (even–odd rule, so holes are cut out) by a
 * scanline: each row's centre line is crossed with the active edges, crossings are sorted, and the
 * cells between pairs are filled. An edge table sorted by lower y keeps the work O(E log E + rows ×
 * active edges + cells). Edges are half-open in y, so a vertex on the scanline counts once.
 *
 * @param polygons validated polygons (see {@link polygonsExtent})
 * @param spec the grid
 * @returns mask, 1 inside, 0 outside, index i + j·width
 * @example
 * gridPolygonMask([[[[0, 0], [20, 0], [20, 20], [0, 20]]]], { originX: 0, originY: 0, cellSize: 10, width: 3, height: 3 });
 */
export function gridPolygonMask(polygons: PlanarPolygon[], spec: GridSpec): Uint8Array {
  const { originX, originY, cellSize, width, height } = spec;
  const mask = new Uint8Array(width * height);
  // Edge table: lower y, upper y, x at lower y, dx/dy; horizontal edges never cross a scanline.
  const edges: number[][] = [];
  for (const poly of polygons) {
    for (const ring of poly) {
      const n = ring.length;
      for (let k = 0; k < n; k++) {
        const a = ring[k];
        const b = ring[(k + 1) % n];
        if (a[1] === b[1]) continue;
        const [lo, hi] = a[1] < b[1] ? [a, b] : [b, a];
        edges.push([lo[1], hi[1], lo[0], (hi[0] - lo[0]) / (hi[1] - lo[1])]);
      }
    }
  }
  edges.sort((e, f) => e[0] - f[0]);
  let next = 0;
  let active: number[][] = [];
  const xs: number[] = [];
  for (let j = 0; j < height; j++) {
    const yc = originY + (j + 0.5) * cellSize;
    while (next < edges.length && edges[next][0] <= yc) active.push(edges[next++]);
    active = active.filter((e) => e[1] > yc);
    xs.length = 0;
    for (const e of active) if (e[0] <= yc) xs.push(e[2] + (yc - e[0]) * e[3]);
    if (xs.length < 2) continue;
    xs.sort((p, q) => p - q);
    const row = j * width;
    for (let k = 0; k + 1 < xs.length; k += 2) {
      // Centres x_i = originX + (i + 0.5)·cellSize with xs[k] ≤ x_i < xs[k + 1].
      const i0 = Math.max(0, Math.ceil((xs[k] - originX) / cellSize - 0.5));
      const i1 = Math.min(width - 1, Math.ceil((xs[k + 1] - originX) / cellSize - 0.5) - 1);
      if (i1 >= i0) mask.fill(1, row + i0, row + i1 + 1);
    }
  }
  return mask;
}

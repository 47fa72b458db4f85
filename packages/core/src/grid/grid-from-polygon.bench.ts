/**
 * Benchmark: study-area masks on 1000 × 1000 and 2000 × 2000 grids for an invented coastline
 * (a wobbly disc with a lake and an island). Prints a table.
 * Run: node --import tsx src/grid/grid-from-polygon.bench.ts
 */
import type { PlanarPolygon } from '../types.js';
import { gridFromPolygon } from './grid-from-polygon.js';

function wobblyRing(r: number, vertices: number, cx = 0, cy = 0): Array<[number, number]> {
  const ring: Array<[number, number]> = [];
  for (let k = 0; k < vertices; k++) {
    const t = (2 * Math.PI * k) / vertices;
    const rr = r * (1 + 0.15 * Math.sin(7 * t) + 0.05 * Math.sin(31 * t));
    ring.push([cx + rr * Math.cos(t), cy + rr * Math.sin(t)]);
  }
  return ring;
}

const rows: string[][] = [['grid', 'polygon vertices', 'inside cells', 'wall (ms)', 'cpu (ms)']];
for (const [cells, vertices] of [[1000, 2000], [1000, 50_000], [2000, 50_000]]) {
  const land: PlanarPolygon = [wobblyRing(10_000, vertices), wobblyRing(1500, 200, 2000, 1000)];
  const island: PlanarPolygon = [wobblyRing(800, 100, 10_500, 10_500)];
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const poly of [land, island]) {
    for (const [x, y] of poly[0]) [minX, maxX, minY, maxY] = [Math.min(minX, x), Math.max(maxX, x), Math.min(minY, y), Math.max(maxY, y)];
  }
  // Slightly above extent / cells so round-off cannot add a column.
  const cellSize = (Math.max(maxX - minX, maxY - minY) / cells) * (1 + 1e-9);
  gridFromPolygon([land, island], cellSize * 4, { align: false }); // warm-up
  const t = performance.now();
  const c = process.cpuUsage();
  const { spec, insideCells } = gridFromPolygon([land, island], cellSize, { align: false });
  const u = process.cpuUsage(c);
  rows.push([`${spec.width} × ${spec.height}`, String(vertices), String(insideCells), (performance.now() - t).toFixed(0), ((u.user + u.system) / 1000).toFixed(0)]);
}
const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
for (const r of rows) console.log(r.map((x, c) => x.padStart(widths[c])).join('  '));

/**
 * Benchmark: validating and projecting 1,000,000 customer points (UTM and LAEA), and the inverse.
 * Prints a table; the cpu column is this process's CPU time (meaningful when cores are shared).
 * Run: node --import tsx src/projection/projection-transform.bench.ts
 */
import { randomSeeded } from '../lib/random-seeded.js';
import { pointsFromLonLat } from '../points/points-from-lon-lat.js';
import { projectionForLonLat } from './projection-for-lon-lat.js';
import { projectionConverter } from './projection-transform.js';

const n = 1_000_000;
const rng = randomSeeded(9);
// Invented offshore city (open sea), ~20 km across.
const lon = Float64Array.from({ length: n }, () => -31.8 + 0.1 * rng.normal());
const lat = Float64Array.from({ length: n }, () => -38 + 0.08 * rng.normal());
const w = Float64Array.from({ length: n }, () => 1 + 100 * rng.uniform());

function timed<T>(fn: () => T): { value: T; wall: number; cpu: number } {
  const t = performance.now();
  const c = process.cpuUsage();
  const value = fn();
  const u = process.cpuUsage(c);
  return { value, wall: performance.now() - t, cpu: (u.user + u.system) / 1000 };
}

const rows: string[][] = [['step', 'points', 'wall (ms)', 'cpu (ms)']];
const v = timed(() => pointsFromLonLat(lon, lat, w));
rows.push(['pointsFromLonLat (validate)', String(n), v.wall.toFixed(0), v.cpu.toFixed(0)]);
for (const kind of ['utm', 'laea'] as const) {
  const choose = timed(() => projectionForLonLat(lon, lat, { projection: kind }));
  rows.push([`projectionForLonLat ${kind}`, String(n), choose.wall.toFixed(0), choose.cpu.toFixed(0)]);
  const conv = projectionConverter(choose.value);
  const fwd = timed(() => conv.forward(lon, lat));
  rows.push([`forward ${kind}`, String(n), fwd.wall.toFixed(0), fwd.cpu.toFixed(0)]);
  const inv = timed(() => conv.inverse(fwd.value.x, fwd.value.y));
  rows.push([`inverse ${kind}`, String(n), inv.wall.toFixed(0), inv.cpu.toFixed(0)]);
}
const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
for (const r of rows) console.log(r.map((x, c) => (c === 0 ? x.padEnd(widths[c]) : x.padStart(widths[c]))).join('  '));

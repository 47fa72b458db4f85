/**
 * Benchmark: cross-validated bandwidths on seeded Gaussian clusters. Prints a table; the cpu
 * column is this process's CPU time, which stays meaningful when other jobs share the cores.
 * Run: node --import tsx src/bandwidth/bandwidth-cross-validation.bench.ts
 */
import { randomSeeded } from '../lib/random-seeded.js';
import type { KernelName } from '../types.js';
import { bandwidthCrossValidation } from './bandwidth-cross-validation.js';
import { bandwidthNormalReference } from './bandwidth-normal-reference.js';

function clusters(n: number, seed: number) {
  const rng = randomSeeded(seed);
  const centres = [[0, 0], [4000, 1500], [-2500, 3000]];
  const p = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  for (let i = 0; i < n; i++) {
    const c = centres[i % 3];
    p.x[i] = c[0] + 800 * rng.normal();
    p.y[i] = c[1] + 800 * rng.normal();
    p.w[i] = 1 + Math.floor(20 * rng.uniform());
  }
  return p;
}

const rows: string[][] = [['points', 'kernel', 'method', 'h (m)', 'normal ref (m)', 'wall (ms)', 'cpu (ms)']];
for (const n of [2000, 100_000]) {
  const pts = clusters(n, 42);
  for (const kernel of ['gaussian', 'quartic'] as KernelName[]) {
    for (const method of ['likelihood', 'least-squares'] as const) {
      bandwidthCrossValidation(pts, kernel, { method }); // warm-up (JIT, kernel tables)
      const t = performance.now();
      const c = process.cpuUsage();
      const r = bandwidthCrossValidation(pts, kernel, { method });
      const cpu = process.cpuUsage(c);
      const ms = performance.now() - t;
      rows.push([String(n), kernel, method, r.value.toFixed(0), bandwidthNormalReference(pts, kernel).value.toFixed(0), ms.toFixed(0), ((cpu.user + cpu.system) / 1000).toFixed(0)]);
    }
  }
}
const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
for (const r of rows) console.log(r.map((v, c) => v.padStart(widths[c])).join('  '));

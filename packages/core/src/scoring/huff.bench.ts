/**
 * Benchmark: Huff scoring of 1,000 candidates against today's network of 200 stores on a
 * 1000 × 1000 demand surface (50 m cells, invented smooth demand over 50 × 50 km).
 * Prints a table; the cpu column is this process's CPU time (meaningful when cores are shared).
 * Run: node --import tsx src/scoring/huff.bench.ts [--quick]   (--quick: 500 × 500, 200 candidates)
 */
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec } from '../types.js';
import { huffCandidate } from './huff-candidate.js';
import { huffCandidatesAlone } from './huff-candidates-alone.js';
import { huffBaseCaptured, huffGrid } from './huff-grid.js';
import { ringDemands } from './ring-demand.js';
import type { ScoringSurface } from './scoring-surface.js';

const quick = process.argv.includes('--quick');
const side = quick ? 500 : 1000;
const nCand = quick ? 200 : 1000;
const nOwn = 40;
const nComp = 160;
const spec: GridSpec = { originX: 0, originY: 0, cellSize: 50_000 / side, width: side, height: side };
const rng = randomSeeded(21);
const extent = 50_000;

function timed<T>(fn: () => T): { value: T; wall: number; cpu: number } {
  const t = performance.now();
  const c = process.cpuUsage();
  const value = fn();
  const u = process.cpuUsage(c);
  return { value, wall: performance.now() - t, cpu: (u.user + u.system) / 1000 };
}

// Demand: 30 invented districts (Gaussian bumps) on a low background, λ per km².
const bumps = Array.from({ length: 30 }, () => ({
  x: extent * (0.1 + 0.8 * rng.uniform()),
  y: extent * (0.1 + 0.8 * rng.uniform()),
  s: 800 + 3000 * rng.uniform(),
  a: 500 + 4000 * rng.uniform(),
}));
const values = new Float64Array(side * side);
for (let j = 0; j < side; j++) {
  const y = (j + 0.5) * spec.cellSize;
  for (let i = 0; i < side; i++) {
    const x = (i + 0.5) * spec.cellSize;
    let v = 5;
    for (const b of bumps) v += b.a * Math.exp(-((x - b.x) ** 2 + (y - b.y) ** 2) / (2 * b.s * b.s));
    values[i + j * side] = v;
  }
}
const surface: ScoringSurface = { spec, values };
const at = (kind: Site['kind'], id: string): Site => ({
  id,
  kind,
  x: extent * rng.uniform(),
  y: extent * rng.uniform(),
  attractiveness: 0.5 + 2 * rng.uniform(),
});
const own = Array.from({ length: nOwn }, (_, k) => at('own', `own-${k}`));
const competitors = Array.from({ length: nComp }, (_, k) => at('competitor', `rival-${k}`));
const candidates = Array.from({ length: nCand }, (_, k) => at('candidate', `cand-${k}`));

const rows: string[][] = [['step', 'work', 'wall (ms)', 'cpu (ms)']];
const push = (step: string, work: string, t: { wall: number; cpu: number }) => rows.push([step, work, t.wall.toFixed(0), t.cpu.toFixed(0)]);

const grid = timed(() => huffGrid(surface, own, competitors, { beta: 2 }));
push('base denominator S_c + own share (β = 2)', `${side}² cells × ${nOwn + nComp} stores`, grid);
const base = timed(() => huffBaseCaptured(grid.value, own));
push('own stores today', `${side}² cells × ${nOwn} stores`, base);
const all = timed(() => huffCandidatesAlone(grid.value, candidates));
push('candidates alone: captured + cannibalization', `${nCand} cand. × ${side}² cells`, all);
const naive = timed(() => candidates.slice(0, 50).map((c) => huffCandidate(grid.value, c, false)));
push('  same, one candidate at a time (50 cand.)', `50 × ${side}² cells`, naive);
const top = timed(() => candidates.slice(0, 10).map((c) => huffCandidate(grid.value, c, true)));
push('per-own-store split, 10 candidates', `10 × ${side}² × (1 + ${nOwn})`, top);
const rings = timed(() => candidates.map((c) => ringDemands(surface, c.x, c.y)));
push('rings 1 / 3 / 5 km', `${nCand} candidates`, rings);
const gridB = timed(() => huffGrid(surface, own, competitors, { beta: 2.5 }));
push('base denominator, β = 2.5 (exp·ln)', `${side}² cells × ${nOwn + nComp} stores`, gridB);
const allB = timed(() => huffCandidatesAlone(gridB.value, candidates.slice(0, 100)));
push('100 candidates alone, β = 2.5', `100 × ${side}² cells`, allB);

const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
for (const r of rows) console.log(r.map((x, c) => (c === 0 ? x.padEnd(widths[c]) : x.padStart(widths[c]))).join('  '));
const checksum = all.value.captured.reduce((s, v) => s + v, 0);
console.log(`\ntotal demand ${grid.value.cells.total.toFixed(0)}; Σ captured over candidates ${checksum.toFixed(0)}; Node ${process.version}`);

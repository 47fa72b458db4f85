/**
 * One benchmark case in its own process, so its peak memory (maxRSS) is its own:
 * `node --import tsx bench/bench-case.ts '<case JSON>'` prints one JSON line with the result.
 */
import { kdeBinned } from '../src/kde/kde-binned.js';
import { kdeExact } from '../src/kde/kde-exact.js';
import { randomSeeded } from '../src/lib/random-seeded.js';
import type { GridSpec, KernelName } from '../src/types.js';
import { benchPoints } from './bench-points.js';

/** What the parent asks a child to run. */
export interface BenchCase {
  n: number;
  side: number;
  cellSize: number;
  kernel: KernelName;
  bandwidth: number;
  method: 'exact' | 'binned';
  /** Cells (i + j·width) whose values to return; binned picks them when absent. */
  samples?: number[];
}

/** What a child reports. */
export interface BenchCaseResult {
  seconds: number;
  /** User + system CPU time of the computation: less sensitive to other load than wall time. */
  cpuSeconds: number;
  /** Peak resident set of the whole process, MB. */
  peakRssMb: number;
  /** Peak RSS growth during the computation itself (over the peak after generating the points), MB. */
  computeRssMb: number;
  max: number;
  maxCell: number;
  samples: number[];
  values: number[];
}

/** The bench's study area: a square of `side` cells of `cellSize` metres from (0, 0). */
export function benchSpec(side: number, cellSize: number): GridSpec {
  return { originX: 0, originY: 0, cellSize, width: side, height: side };
}

function samplesPick(values: Float64Array, maxCell: number, max: number): number[] {
  // The peak, 200 cells among those above 1 % of the peak, and 100 anywhere (seeded).
  const rng = randomSeeded(99);
  const strong: number[] = [];
  for (let c = 0; c < values.length; c++) if (values[c] > 0.01 * max) strong.push(c);
  const picks = new Set<number>([maxCell]);
  for (let k = 0; k < 200 && strong.length > 0; k++) picks.add(strong[Math.floor(rng.uniform() * strong.length)]);
  for (let k = 0; k < 100; k++) picks.add(Math.floor(rng.uniform() * values.length));
  return [...picks];
}

function run(c: BenchCase): BenchCaseResult {
  const spec = benchSpec(c.side, c.cellSize);
  const extent = { minX: 0, minY: 0, maxX: c.side * c.cellSize, maxY: c.side * c.cellSize };
  const points = benchPoints(c.n, extent);
  const rssBefore = process.resourceUsage().maxRSS;
  const cpu0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  const { values } =
    c.method === 'binned'
      ? kdeBinned(points, spec, c.kernel, c.bandwidth)
      : kdeExact(points, spec, c.kernel, c.bandwidth, { oversample: 1 });
  const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
  const cpu = process.cpuUsage(cpu0);
  const rssAfter = process.resourceUsage().maxRSS;
  let maxCell = 0;
  for (let k = 1; k < values.length; k++) if (values[k] > values[maxCell]) maxCell = k;
  const max = values[maxCell] * 1e6;
  const samples = c.samples ?? samplesPick(values, maxCell, values[maxCell]);
  return {
    seconds,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
    peakRssMb: rssAfter / 1024,
    computeRssMb: (rssAfter - rssBefore) / 1024,
    max,
    maxCell,
    samples,
    values: samples.map((k) => values[k] * 1e6),
  };
}

const arg = process.argv[2];
if (arg) process.stdout.write(`${JSON.stringify(run(JSON.parse(arg) as BenchCase))}\n`);

/**
 * Benchmark: Huff scoring of 1,000 candidates against today's network of 200 stores (40 own, 160
 * competitors) on a 1000 × 1000 demand surface (50 m cells, invented smooth demand over 50 × 50 km).
 * Every step runs in its own child process, so its peak RSS is its own; cpu is the process's CPU
 * time over all its threads (meaningful when the 2 cores are shared). "2 threads" splits the grid
 * rows in two worker threads (siteScoresPart) and joins the parts (siteScoresFromParts).
 * Run: node --import tsx src/scoring/huff.bench.ts [--quick] [--repeat=N] [--only=step,…]
 * (--quick: 500 × 500, 200 candidates; --repeat: each step N times in its process, fastest wall kept)
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec } from '../types.js';
import { huffCandidate } from './huff-candidate.js';
import { huffCandidatesAlone } from './huff-candidates-alone.js';
import { huffBaseCaptured, huffGrid } from './huff-grid.js';
import { ringDemands } from './ring-demand.js';
import type { ScoringSurface } from './scoring-surface.js';
import { siteScores, siteScoresFromParts, type SiteScores } from './site-scores.js';
import { siteScoresPart, siteScoresRowRanges, type SiteScoreOptions, type SiteScoresPart } from './site-scores-part.js';

const quick = process.argv.includes('--quick');
const side = quick ? 500 : 1000;
const nCand = quick ? 200 : 1000;
const nOwn = 40;
const nComp = 160;
const extent = 50_000;

/** The invented study: 30 districts (Gaussian bumps) on a low background, λ per km², and the sites. */
function study(values?: Float64Array): { surface: ScoringSurface; own: Site[]; competitors: Site[]; candidates: Site[] } {
  const spec: GridSpec = { originX: 0, originY: 0, cellSize: extent / side, width: side, height: side };
  const rng = randomSeeded(21);
  const bumps = Array.from({ length: 30 }, () => ({
    x: extent * (0.1 + 0.8 * rng.uniform()),
    y: extent * (0.1 + 0.8 * rng.uniform()),
    s: 800 + 3000 * rng.uniform(),
    a: 500 + 4000 * rng.uniform(),
  }));
  if (!values) {
    values = new Float64Array(side * side);
    for (let j = 0; j < side; j++) {
      const y = (j + 0.5) * spec.cellSize;
      for (let i = 0; i < side; i++) {
        const x = (i + 0.5) * spec.cellSize;
        let v = 5;
        for (const b of bumps) v += b.a * Math.exp(-((x - b.x) ** 2 + (y - b.y) ** 2) / (2 * b.s * b.s));
        values[i + j * side] = v;
      }
    }
  }
  const at = (kind: Site['kind'], id: string): Site => ({ id, kind, x: extent * rng.uniform(), y: extent * rng.uniform(), attractiveness: 0.5 + 2 * rng.uniform() });
  const own = Array.from({ length: nOwn }, (_, k) => at('own', `own-${k}`));
  const competitors = Array.from({ length: nComp }, (_, k) => at('competitor', `rival-${k}`));
  const candidates = Array.from({ length: nCand }, (_, k) => at('candidate', `cand-${k}`));
  return { surface: { spec, values }, own, competitors, candidates };
}

interface WorkerJob {
  values: Float64Array;
  options: SiteScoreOptions;
  nCandidates: number;
}

/** Worker thread: scores its row range and posts the part back (buffers transferred). */
function workerMain(): void {
  const { values } = workerData as { values: Float64Array };
  const { surface, own, competitors, candidates } = study(values);
  parentPort!.on('message', (job: WorkerJob) => {
    const sites = [...own, ...competitors, ...candidates.slice(0, job.nCandidates)];
    const part = siteScoresPart(surface, sites, job.options);
    const buffers = [part.ownToday, part.captured, part.cannibalization, part.rings, ...(part.cannibalizedFrom ? [part.cannibalizedFrom] : [])].map((a) => a.buffer as ArrayBuffer);
    parentPort!.postMessage(part, buffers);
  });
  parentPort!.postMessage('ready');
}

/** Starts a worker running this file from source (registers tsx first, as the server does). */
function workerStart(values: Float64Array): Promise<Worker> {
  const entry = new URL(import.meta.url).href;
  const code = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
  const w = new Worker(code, { eval: true, workerData: { values }, argv: process.argv.slice(2) });
  return new Promise((resolve, reject) => {
    w.once('message', () => resolve(w));
    w.once('error', reject);
  });
}

/** Scores on two worker threads, one per half of the rows. */
async function siteScoresTwoThreads(workers: Worker[], surface: ScoringSurface, sites: Site[], nCandidates: number, options: SiteScoreOptions): Promise<SiteScores> {
  const ranges = siteScoresRowRanges(surface.spec.height, workers.length);
  const parts = await Promise.all(
    workers.map(
      (w, k) =>
        new Promise<SiteScoresPart>((resolve, reject) => {
          w.once('message', resolve);
          w.once('error', reject);
          w.postMessage({ values: new Float64Array(0), options: { ...options, rows: ranges[k] }, nCandidates } satisfies WorkerJob);
        }),
    ),
  );
  return siteScoresFromParts(surface, sites, parts, options);
}

interface StepResult {
  wall: number;
  cpu: number;
  rssMb: number;
  check: number;
}

/** Child process: builds the study, runs one step, prints one JSON line. */
async function childMain(step: string): Promise<void> {
  const shared = new Float64Array(new SharedArrayBuffer(8 * side * side));
  const { surface, own, competitors, candidates } = study();
  shared.set(surface.values);
  const two = step.endsWith('x2');
  const workers = two ? await Promise.all([workerStart(shared), workerStart(shared)]) : [];
  const grid = ['base', 'alone', 'per-candidate'].includes(step) ? huffGrid(surface, own, competitors, { beta: 2 }) : undefined;
  const sitesOf = (n: number) => [...own, ...competitors, ...candidates.slice(0, n)];
  const sum = (s: SiteScores) => s.candidates.reduce((a, c) => a + c.captured + c.cannibalization + (c.cannibalizedFrom[0]?.demand ?? 0) + c.rings[2].demand, 0);
  const steps: Record<string, () => number | Promise<number>> = {
    grid: () => huffGrid(surface, own, competitors, { beta: 2 }).denominator[0],
    base: () => huffBaseCaptured(grid!, own).reduce((a, b) => a + b, 0),
    alone: () => huffCandidatesAlone(grid!, candidates).captured.reduce((a, b) => a + b, 0),
    'per-candidate': () => candidates.slice(0, 50).reduce((a, c) => a + huffCandidate(grid!, c, false).captured, 0),
    rings: () => candidates.reduce((a, c) => a + ringDemands(surface, c.x, c.y)[2].demand, 0),
    site: () => sum(siteScores(surface, sitesOf(nCand), { breakdown: false })),
    'site-x2': async () => sum(await siteScoresTwoThreads(workers, surface, sitesOf(nCand), nCand, { breakdown: false })),
    'split-200': () => sum(siteScores(surface, sitesOf(200), { breakdown: true })),
    'split-200-x2': async () => sum(await siteScoresTwoThreads(workers, surface, sitesOf(200), 200, { breakdown: true })),
    'split-all-x2': async () => sum(await siteScoresTwoThreads(workers, surface, sitesOf(nCand), nCand, { breakdown: true })),
    'beta-2.5': () => huffCandidatesAlone(huffGrid(surface, own, competitors, { beta: 2.5 }), candidates.slice(0, 100)).captured[0],
    'beta-2.3': () => huffCandidatesAlone(huffGrid(surface, own, competitors, { beta: 2.3 }), candidates.slice(0, 100)).captured[0],
  };
  const repeat = Number(process.argv.find((a) => a.startsWith('--repeat='))?.slice(9) ?? 1);
  let result: StepResult | undefined;
  for (let k = 0; k < repeat; k++) {
    const t = performance.now();
    const c = process.cpuUsage();
    const check = await steps[step]();
    const u = process.cpuUsage(c);
    const wall = performance.now() - t;
    if (!result || wall < result.wall) result = { wall, cpu: (u.user + u.system) / 1000, rssMb: process.resourceUsage().maxRSS / 1024, check };
  }
  await Promise.all(workers.map((w) => w.terminate()));
  console.log(JSON.stringify(result!));
}

function parentMain(): void {
  const s2 = `${side}²`;
  const rows: Array<[string, string, string]> = [
    ['grid', 'base denominator S_c + own share (β = 2)', `${s2} cells × ${nOwn + nComp} stores`],
    ['base', 'own stores today', `${s2} cells × ${nOwn} stores`],
    ['alone', 'candidates alone: captured + cannibalization', `${nCand} cand. × ${s2} cells`],
    ['per-candidate', '  reference: one candidate at a time (50)', `50 × ${s2} cells`],
    ['rings', 'rings 1 / 3 / 5 km', `${nCand} candidates`],
    ['site', 'siteScores, no per-store split, 1 thread', `all of the above`],
    ['site-x2', 'siteScores, no per-store split, 2 threads', `rows split in two`],
    ['split-200', 'siteScores with per-own-store split, 1 thread', `200 cand. × ${nOwn} own × ${s2}`],
    ['split-200-x2', 'siteScores with per-own-store split, 2 threads', `200 cand. × ${nOwn} own × ${s2}`],
    ['split-all-x2', 'siteScores with per-own-store split, 2 threads', `${nCand} cand. × ${nOwn} own × ${s2}`],
    ['beta-2.5', 'grid + 100 candidates, β = 2.5 (square roots)', `100 × ${s2} cells`],
    ['beta-2.3', 'grid + 100 candidates, β = 2.3 (exp·ln)', `100 × ${s2} cells`],
  ];
  const only = process.argv.find((a) => a.startsWith('--only='))?.slice(7).split(',');
  const table: string[][] = [['step', 'work', 'wall (ms)', 'cpu (ms)', 'peak RSS (MB)']];
  const checks: Record<string, number> = {};
  for (const [step, label, work] of rows) {
    if (only && !only.includes(step)) continue;
    const pass = process.argv.filter((a) => a === '--quick' || a.startsWith('--repeat='));
    const out = execFileSync(process.execPath, ['--import', 'tsx', fileURLToPath(import.meta.url), `--step=${step}`, ...pass], { encoding: 'utf8', maxBuffer: 1 << 20 });
    const r = JSON.parse(out.trim().split('\n').pop()!) as StepResult;
    checks[step] = r.check;
    table.push([label, work, r.wall.toFixed(0), r.cpu.toFixed(0), r.rssMb.toFixed(0)]);
  }
  const widths = table[0].map((_, c) => Math.max(...table.map((r) => r[c].length)));
  for (const r of table) console.log(r.map((x, c) => (c === 0 ? x.padEnd(widths[c]) : x.padStart(widths[c]))).join('  '));
  const rel = (a: string, b: string) => (checks[a] !== undefined && checks[b] !== undefined ? Math.abs(checks[a] - checks[b]) / Math.abs(checks[b]) : NaN);
  console.log(`\n1 vs 2 threads, relative difference of the summed scores: ${rel('site-x2', 'site').toExponential(1)} (no split), ${rel('split-200-x2', 'split-200').toExponential(1)} (split); Node ${process.version}`);
}

const stepArg = process.argv.find((a) => a.startsWith('--step='));
if (!isMainThread) workerMain();
else if (stepArg) await childMain(stepArg.slice(7));
else parentMain();

/**
 * Report build times: ranking XLSX, CSV and GeoJSON for runs of 10, 100 and 1,000 invented candidates
 * (10 own stores, 40 competitors). Prints a table of wall time and file size.
 * Run: cd apps/server && node --import tsx src/modules/report/report.bench.ts [--sizes 10,100,1000]
 */
import { performance } from 'node:perf_hooks';
import type { RunSiteJson, ScoringRunJson } from '../scoring/scoring.types.js';
import { reportRankingCsv } from './report-csv.js';
import { reportRunFixture } from './report-fixture.js';
import { reportSitesGeojson } from './report-geojson.js';
import { reportFromRun } from './report-model.js';
import { reportWorkbook } from './report-xlsx.js';

function runOf(n: number): ScoringRunJson {
  const run = reportRunFixture();
  const own: RunSiteJson[] = Array.from({ length: 10 }, (_, k) => ({
    siteId: `o${k}`,
    name: `Own café ${k}`,
    kind: 'own',
    lon: -38.5 + k * 0.003,
    lat: 44.5,
    attractiveness: 120,
    attractivenessLabel: 'sales floor m²',
    notes: '',
  }));
  const rivals: RunSiteJson[] = Array.from({ length: 40 }, (_, k) => ({
    siteId: `k${k}`,
    name: `Rival ${k}`,
    kind: 'competitor',
    lon: -38.5,
    lat: 44.5 + k * 0.002,
    attractiveness: 150,
    attractivenessLabel: 'sales floor m²',
    notes: '',
  }));
  const cands: RunSiteJson[] = Array.from({ length: n }, (_, k) => ({
    siteId: `c${k}`,
    name: `Candidate ${k} on Harbour Row`,
    kind: 'candidate',
    lon: -38.6 + (k % 40) * 0.005,
    lat: 44.4 + Math.floor(k / 40) * 0.004,
    attractiveness: 80 + (k % 7) * 10,
    attractivenessLabel: 'sales floor m²',
    notes: k % 3 ? '' : 'Lease offer expected',
  }));
  run.sites = [...cands, ...own, ...rivals];
  run.results = {
    totalDemand: 1_000_000,
    ownToday: own.map((o) => ({ siteId: o.siteId, name: o.name, demand: 20_000 })),
    candidates: cands.map((c, k) => {
      const captured = 30_000 - k * 10;
      const from = own.map((o, j) => ({
        siteId: o.siteId,
        name: o.name,
        demand: (captured / 50) * ((j % 3) + 1),
      }));
      const cannibalization = from.reduce((s, f) => s + f.demand, 0);
      return {
        siteId: c.siteId,
        name: c.name,
        rank: k + 1,
        value: captured - cannibalization,
        captured,
        cannibalization,
        cannibalizedFrom: from,
        netNew: captured - cannibalization,
        shareOfTotal: captured / 1_000_000,
        rings: [
          { radiusM: 1000, demand: 5000 },
          { radiusM: 3000, demand: 20_000 },
        ],
        explanation: `Captures ${captured} customers; ranks ${k + 1} of ${n}.`,
      };
    }),
  };
  run.stability = null;
  return run;
}

async function timed<T>(f: () => Promise<T> | T): Promise<{ value: T; ms: number }> {
  const t0 = performance.now();
  const value = await f();
  return { value, ms: performance.now() - t0 };
}

const arg = process.argv.indexOf('--sizes');
const sizes = arg > 0 ? process.argv[arg + 1].split(',').map(Number) : [10, 100, 1000];
const rows: string[][] = [['candidates', 'format', 'wall ms', 'size KiB']];
for (const n of sizes) {
  const model = reportFromRun(runOf(n), 'North corridor');
  const xlsx = await timed(() => reportWorkbook(model, new Date()));
  const csv = await timed(() => reportRankingCsv(model));
  const geo = await timed(() => JSON.stringify(reportSitesGeojson(runOf(n))));
  rows.push([String(n), 'xlsx', xlsx.ms.toFixed(0), (xlsx.value.length / 1024).toFixed(0)]);
  rows.push([
    String(n),
    'csv',
    csv.ms.toFixed(1),
    (Buffer.byteLength(csv.value) / 1024).toFixed(0),
  ]);
  rows.push([
    String(n),
    'geojson',
    geo.ms.toFixed(1),
    (Buffer.byteLength(geo.value) / 1024).toFixed(0),
  ]);
}
const widths = rows[0].map((_, k) => Math.max(...rows.map((r) => r[k].length)));
for (const r of rows) console.log(r.map((c, k) => c.padStart(widths[k])).join('  '));

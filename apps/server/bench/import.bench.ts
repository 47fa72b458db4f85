// Customer-file import benchmark: an invented 1,000,000-row CSV (lon, lat, spend and a fake name
// column that the import discards) goes through the real HTTP upload and the real background
// import on a SQLite file database. Prints a table: wall time per phase, rows/s and peak RSS
// (sampled every 50 ms). Run: npm run bench:import -w @demandscape/server [-- --rows 200000] [--format xlsx]
import { createWriteStream, mkdtempSync, rmSync, statSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import ExcelJS from 'exceljs';
import request from 'supertest';
import { createApp } from '../src/app.js';
import { configFromEnv } from '../src/config.js';

const rowsArg = process.argv.indexOf('--rows');
const ROWS = rowsArg > 0 ? Number(process.argv[rowsArg + 1]) : 1_000_000;
const formatArg = process.argv.indexOf('--format');
const FORMAT: 'csv' | 'xlsx' =
  formatArg > 0 && process.argv[formatArg + 1] === 'xlsx' ? 'xlsx' : 'csv';

/** Seeded LCG (Numerical Recipes constants) so every run writes the same file. */
function random(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

async function csvWrite(path: string, rows: number): Promise<void> {
  // Invented customers around the fictional Quillport (open sea, lon -38.5, lat 44.5).
  const rnd = random(20261202);
  const out = createWriteStream(path);
  out.write('customer_name,lon,lat,spend\n');
  let buf = '';
  for (let i = 0; i < rows; i++) {
    const r = 0.08 * Math.sqrt(-2 * Math.log(1 - rnd()));
    const a = 2 * Math.PI * rnd();
    buf += `Larchloaf Guest ${i},${(-38.5 + (r * Math.cos(a)) / 0.713).toFixed(6)},${(44.5 + r * Math.sin(a)).toFixed(6)},${(5 + 400 * rnd()).toFixed(2)}\n`;
    if (buf.length > 1 << 20) {
      if (!out.write(buf)) await once(out, 'drain');
      buf = '';
    }
  }
  out.end(buf);
  await once(out, 'finish');
}

async function xlsxWrite(path: string, rows: number): Promise<void> {
  const rnd = random(20261202);
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ filename: path, useSharedStrings: false });
  const sheet = wb.addWorksheet('Customers');
  sheet.addRow(['customer_name', 'lon', 'lat', 'spend']).commit();
  for (let i = 0; i < rows; i++) {
    const r = 0.08 * Math.sqrt(-2 * Math.log(1 - rnd()));
    const a = 2 * Math.PI * rnd();
    sheet
      .addRow([
        `Larchloaf Guest ${i}`,
        -38.5 + (r * Math.cos(a)) / 0.713,
        44.5 + r * Math.sin(a),
        5 + 400 * rnd(),
      ])
      .commit();
  }
  sheet.commit();
  await wb.commit();
}

let peakRss = 0;
const sampler = setInterval(() => {
  peakRss = Math.max(peakRss, process.memoryUsage().rss);
}, 50);

const dir = mkdtempSync(join(tmpdir(), 'ds-import-bench-'));
try {
  const csv = join(dir, `customers.${FORMAT}`);
  if (FORMAT === 'xlsx') await xlsxWrite(csv, ROWS);
  else await csvWrite(csv, ROWS);
  const sizeMb = statSync(csv).size / 1024 / 1024;
  const ds = await createApp(
    configFromEnv({
      NODE_ENV: 'test',
      DATA_DIR: dir,
      DATABASE_FILE: join(dir, 'bench.sqlite'),
      RATE_LIMIT_AUTH_PER_MINUTE: '1000',
      WEB_DIST: '/nonexistent',
      UPLOAD_MAX_BYTES: String(1024 * 1024 * 1024),
    }),
  );
  const agent = request.agent(ds.app);
  let token = (await agent.get('/api/auth/csrf')).body.csrfToken as string;
  await agent
    .post('/api/auth/sign-up')
    .set('x-csrf-token', token)
    .send({ email: 'bench@larchloaf.example', password: 'quillport-harbour-27', name: 'Bench' })
    .expect(201);
  token = (await agent.get('/api/auth/csrf')).body.csrfToken;
  const org = (
    await agent
      .post('/api/organizations')
      .set('x-csrf-token', token)
      .send({ name: 'Bench' })
      .expect(201)
  ).body.organization.id;
  const ws = (
    await agent
      .post(`/api/organizations/${org}/workspaces`)
      .set('x-csrf-token', token)
      .send({ name: 'Bench' })
      .expect(201)
  ).body.workspace.id;
  const base = `/api/organizations/${org}/workspaces/${ws}/customer-files`;

  global.gc?.();
  peakRss = process.memoryUsage().rss;
  const rssBefore = peakRss;
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const up = await agent.post(base).set('x-csrf-token', token).attach('file', csv).expect(201);
  const t1 = performance.now();
  const c1 = process.cpuUsage();
  const id = up.body.customerFile.id;
  await agent
    .post(`${base}/${id}/import`)
    .set('x-csrf-token', token)
    .send({ mapping: { lon: 'lon', lat: 'lat', weight: 'spend' }, weightKind: 'spend' })
    .expect(202);
  let file;
  for (;;) {
    file = (await agent.get(`${base}/${id}`)).body.customerFile;
    if (file.status !== 'importing') break;
    // The web app polls about once a second; 100 ms keeps the timing resolution without the polls costing CPU.
    await new Promise((r) => setTimeout(r, 100));
  }
  const t2 = performance.now();
  const c2 = process.cpuUsage();
  clearInterval(sampler);
  if (file.status !== 'imported')
    throw new Error(`import ${file.status}: ${JSON.stringify(file.error)}`);
  await ds.close();

  const s = (ms: number) => (ms / 1000).toFixed(2);
  const mb = (b: number) => (b / 1024 / 1024).toFixed(0);
  const cpu = (a: NodeJS.CpuUsage, b: NodeJS.CpuUsage) =>
    ((b.user - a.user + b.system - a.system) / 1e6).toFixed(2);
  console.log(
    `\nCustomer-file import, ${ROWS.toLocaleString('en')} rows, ${sizeMb.toFixed(1)} MB ${FORMAT.toUpperCase()} (lon, lat, spend + a name column that is discarded), SQLite file database\n`,
  );
  console.log('| phase | wall (s) | CPU (s) | rows/s (wall) | notes |');
  console.log('|---|---:|---:|---:|---|');
  console.log(
    `| upload (HTTP multipart → disk, encoding scan, detection, preview) | ${s(t1 - t0)} | ${cpu(c0, c1)} | – | ${sizeMb.toFixed(1)} MB |`,
  );
  console.log(
    `| import (parse, validate, outliers, pack, write chunks) | ${s(t2 - t1)} | ${cpu(c1, c2)} | ${Math.round(ROWS / ((t2 - t1) / 1000)).toLocaleString('en')} | ${file.acceptedCount.toLocaleString('en')} accepted, ${file.rejectedCount} rejected, ${file.flaggedCount} flagged |`,
  );
  console.log(
    `| total | ${s(t2 - t0)} | ${cpu(c0, c2)} | ${Math.round(ROWS / ((t2 - t0) / 1000)).toLocaleString('en')} | target < 20 s |`,
  );
  console.log(
    `\npeak RSS ${mb(peakRss)} MB (before upload ${mb(rssBefore)} MB; target < 1024 MB); Node ${process.version}; load average ${loadavg()[0].toFixed(1)} on ${availableParallelism()} cores\n`,
  );
} finally {
  clearInterval(sampler);
  rmSync(dir, { recursive: true, force: true });
}

// Demand-surface run benchmark, end to end: invented clustered customers around the fictional
// Quillport (open sea) are stored in the documented chunk format, then each size goes through the
// real HTTP create (engine checks + credit reservation), the real runner (atomic claim, Bree worker
// thread, progress, result write) and the web-raster endpoint. Prints a table of wall times.
// Run: npm run bench:surface -w @demandscape/server [-- --sizes 100000,1000000]
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createApp } from '../src/app.js';
import { configFromEnv } from '../src/config.js';
import { creditsGrant } from '../src/modules/billing/credits.service.js';
import { CustomerFileSchema } from '../src/modules/customer-file/customer-file.entity.js';
import { CustomerPointChunkSchema } from '../src/modules/customer-file/customer-point-chunk.entity.js';
import { customerPointsPack } from '../src/modules/customer-file/customer-points.js';
import { QUILLPORT_CLUSTERS, uniformSeeded } from '../test/surface-fixtures.js';

const sizesArg = process.argv.indexOf('--sizes');
const SIZES = sizesArg > 0 ? process.argv[sizesArg + 1].split(',').map(Number) : [100_000, 1_000_000];

/** Three neighbourhood clusters and a thin background around lon −38.5, lat 44.5 (Mulberry32, seeded). */
function demoPoints(n: number) {
  const rand = uniformSeeded(20261202);
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const clusters = QUILLPORT_CLUSTERS;
  const mLat = 111_320;
  const mLon = mLat * Math.cos((44.5 * Math.PI) / 180);
  const lon = new Float64Array(n);
  const lat = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const bg = rand() < 0.1;
    const c = clusters[Math.floor(rand() * 3)];
    const e = bg ? (rand() - 0.5) * 12 : c.e + c.sd * normal();
    const no = bg ? (rand() - 0.5) * 12 : c.n + c.sd * normal();
    lon[k] = -38.5 + (e * 1000) / mLon;
    lat[k] = 44.5 + (no * 1000) / mLat;
    w[k] = 5 + Math.floor(rand() * 400);
  }
  return { lon, lat, w, count: n };
}

const dir = mkdtempSync(join(tmpdir(), 'ds-surface-bench-'));
const rows: string[][] = [];
try {
  const ds = await createApp(
    configFromEnv({ NODE_ENV: 'test', DATA_DIR: dir, DATABASE_FILE: join(dir, 'bench.sqlite'), RATE_LIMIT_AUTH_PER_MINUTE: '1000', WEB_DIST: '/nonexistent', RUNNER_CONCURRENCY: '1' }),
  );
  const agent = request.agent(ds.app);
  let token = (await agent.get('/api/auth/csrf')).body.csrfToken as string;
  await agent.post('/api/auth/sign-up').set('x-csrf-token', token).send({ email: 'bench@larchloaf.example', password: 'quillport-harbour-27', name: 'Bench' }).expect(201);
  token = (await agent.get('/api/auth/csrf')).body.csrfToken;
  const orgId = (await agent.post('/api/organizations').set('x-csrf-token', token).send({ name: 'Larchloaf bench' }).expect(201)).body.organization.id;
  const wsId = (await agent.post(`/api/organizations/${orgId}/workspaces`).set('x-csrf-token', token).send({ name: 'Bench' }).expect(201)).body.workspace.id;
  await creditsGrant(ds.orm.em.fork(), orgId, 1_000_000, 'bench', 'benchmark credits');
  const base = `/api/organizations/${orgId}/workspaces/${wsId}/surfaces`;
  await ds.surfaceRunner.start();

  for (const n of SIZES) {
    const points = demoPoints(n);
    const em = ds.orm.em.fork();
    const fileId = randomUUID();
    em.create(CustomerFileSchema, {
      id: fileId, organization: orgId, workspace: wsId, name: `bench-${n}.csv`, sizeBytes: n * 40, format: 'csv', status: 'imported',
      detected: { columns: ['lon', 'lat', 'spend'], hasHeader: true, delimiter: ',', decimalComma: false, encoding: 'utf-8', suggested: {} },
      mapping: { lon: 'lon', lat: 'lat', weight: 'spend' }, weightKind: 'spend', rowCount: n, acceptedCount: n, importedAt: new Date(),
    } as never);
    for (let seq = 0, start = 0; start < n; seq++, start += 65_536) {
      const count = Math.min(65_536, n - start);
      em.create(CustomerPointChunkSchema, { id: randomUUID(), customerFile: fileId, seq, count, data: customerPointsPack(points, start, count), flags: Buffer.alloc(count) } as never);
    }
    await em.flush();

    const t0 = performance.now();
    const created = await agent
      .post(base)
      .set('x-csrf-token', token)
      .send({ customerFileId: fileId, kernel: 'quartic', bandwidth: { mode: 'rule', rule: 'normal-reference' }, studyArea: { type: 'extent' } });
    if (created.status !== 201) throw new Error(`create failed: ${JSON.stringify(created.body)}`);
    const tCreated = performance.now();
    let s = created.body.surface;
    while (s.status === 'queued' || s.status === 'running') {
      await new Promise((r) => setTimeout(r, 100));
      s = (await agent.get(`${base}/${s.id}`)).body.surface;
    }
    const tDone = performance.now();
    if (s.status !== 'succeeded') throw new Error(`run ${s.status}: ${JSON.stringify(s.error)}`);
    const web = await agent.get(`${base}/${s.id}/web-raster?maxSize=1024`).expect(200);
    const tWeb = performance.now();
    const t = s.timings as Record<string, number>;
    rows.push([
      n.toLocaleString('en-GB'),
      `${s.resolved.grid.width} × ${s.resolved.grid.height}`,
      `${s.resolved.cellSize.value} m`,
      `${Math.round(s.resolved.bandwidth.value)} m`,
      s.resolved.method,
      ((tCreated - t0) / 1000).toFixed(2),
      ((tDone - tCreated) / 1000).toFixed(2),
      `${t.project}/${t.bandwidth}/${t.grid}/${t.density}/${t.contours}`,
      ((tWeb - tDone) / 1000).toFixed(2),
      `${web.headers['x-raster-width']}×${web.headers['x-raster-height']}`,
      ((tWeb - t0) / 1000).toFixed(2),
    ]);
  }
  await ds.close();
} finally {
  rmSync(dir, { recursive: true, force: true });
}

const head = ['points', 'grid', 'cell', 'bandwidth', 'method', 'create s', 'queue→done s', 'worker stages s (project/bw/grid/kde/contours)', 'web raster s', 'pixels', 'total s'];
const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
const line = (r: string[]) => '| ' + r.map((c, i) => c.padEnd(widths[i])).join(' | ') + ' |';
console.log(`Surface runs end to end (quartic, normal-reference bandwidth, suggested cell size); Node ${process.version}, ${availableParallelism()} CPUs, load ${loadavg()[0].toFixed(2)}, ${new Date().toISOString().slice(0, 10)}`);
console.log(line(head));
console.log('|' + widths.map((w) => '-'.repeat(w + 2)).join('|') + '|');
for (const r of rows) console.log(line(r));

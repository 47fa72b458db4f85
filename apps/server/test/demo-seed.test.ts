import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { DEMO_CUSTOMER_COUNT, DEMO_CUSTOMER_FILE_NAME } from '../src/seed/demo-customer-file.js';
import { DEMO_SURFACE_NAME } from '../src/seed/demo-surface.js';
import { DEMO_ORGANIZATION, DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE, demoSeed } from '../src/seed/demo-seed.js';
import { surfaceWait } from './surface-fixtures.js';
import { testAppCreate, testClient } from './utils.js';

describe('demoSeed', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    ds = await testAppCreate();
  });
  afterAll(() => ds.close());

  it('creates the demo organization, workspace and one user per role, and is idempotent', async () => {
    const first = await demoSeed(ds.orm.em.fork());
    expect(first.created).toHaveLength(1 + 4 + 4 + 1 + 1);
    const second = await demoSeed(ds.orm.em.fork());
    expect(second).toEqual({ created: [], organizationId: first.organizationId, workspaceId: first.workspaceId });
    const [{ n }]: { n: number }[] = await ds.orm.em.getConnection().execute('select count(*) as n from users');
    expect(n).toBe(4);
  });

  it('lets every demo user sign in with the demo password and see their role', async () => {
    for (const demo of DEMO_USERS) {
      expect(demo.email.endsWith('.example')).toBe(true);
      const c = await testClient(ds);
      await c.post('/api/auth/sign-in', { email: demo.email, password: DEMO_PASSWORD }).expect(200);
      const me = await c.get('/api/me').expect(200);
      expect(me.body.memberships).toEqual([{ organization: expect.objectContaining({ name: DEMO_ORGANIZATION.name }), role: demo.role }]);
      const orgId = me.body.memberships[0].organization.id;
      const list = await c.get(`/api/organizations/${orgId}/workspaces`).expect(200);
      expect(list.body.workspaces.map((w: { name: string }) => w.name)).toEqual([DEMO_WORKSPACE.name]);
    }
  });
});

describe('demoSeed with the demo customer file', () => {
  let ds: DemandscapeApp;
  let dataDir: string;
  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'ds-demo-seed-'));
    ds = await testAppCreate({ DATA_DIR: dataDir });
  });
  afterAll(async () => {
    await ds.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('uploads and imports the invented customers through the import path and queues one surface, once', async () => {
    const uploadsDir = join(dataDir, 'uploads');
    const imports = { orm: ds.orm, uploadsDir };
    const first = await demoSeed(ds.orm.em.fork(), imports);
    expect(first.created).toEqual(expect.arrayContaining([`customer file ${DEMO_CUSTOMER_FILE_NAME}`, `queued surface ${DEMO_SURFACE_NAME}`]));
    const second = await demoSeed(ds.orm.em.fork(), imports);
    expect(second.created).toEqual([]);

    const analyst = await testClient(ds);
    await analyst.post('/api/auth/sign-in', { email: 'analyst@larchloaf.example', password: DEMO_PASSWORD }).expect(200);
    await analyst.refresh();
    const base = `/api/organizations/${first.organizationId}/workspaces/${first.workspaceId}`;
    const list = await analyst.get(`${base}/customer-files`).expect(200);
    expect(list.body.customerFiles).toHaveLength(1);
    const f = list.body.customerFiles[0];
    // Exact counts: the generator is seeded and the bad rows are fixed (see demo-customer-file.ts):
    // 30,000 good rows + 21 bad rows + 3 repeated rows; 17 rejected; 3 duplicates and 4 outliers
    // (3 swapped, 1 far away) flagged and left out, so exactly the 30,000 good rows are kept.
    expect(f).toMatchObject({
      name: DEMO_CUSTOMER_FILE_NAME,
      status: 'imported',
      weightKind: 'spend',
      weightLabel: 'annual spend (€)',
      excludeFlagged: true,
      rowCount: DEMO_CUSTOMER_COUNT + 21 + 3,
      acceptedCount: DEMO_CUSTOMER_COUNT,
      rejectedCount: 17,
      flaggedCount: 3 + 4,
      excludedCount: 3 + 4,
    });
    expect(f.report.rejected).toEqual({
      'missing-coordinate': 4,
      'non-numeric-coordinate': 4,
      'null-island': 2,
      'likely-swapped': 1,
      'longitude-out-of-range': 1,
      'negative-weight': 3,
      'non-numeric-weight': 2,
    });
    expect(f.report.flagged).toEqual({ 'duplicate-row': 3, outlier: 4 });
    expect(f.createdBy).toMatchObject({ name: DEMO_USERS.find((u) => u.role === 'analyst')!.name });
    // The kept points all lie around Quillport (lon −38.5°, lat 44.5°), within about 30 km
    // (0.38° of longitude at 44.5° N, 0.27° of latitude) [D]; the swapped rows would be ~7,000 km away.
    const [w, s, e, n] = f.bbox as number[];
    expect(w).toBeGreaterThan(-38.5 - 0.38);
    expect(e).toBeLessThan(-38.5 + 0.38);
    expect(s).toBeGreaterThan(44.5 - 0.27);
    expect(n).toBeLessThan(44.5 + 0.27);
    // Only coordinates and spend are kept: the raw upload is gone.
    expect(readdirSync(uploadsDir)).toEqual([]);

    const surfaces = (await analyst.get(`${base}/surfaces`).expect(200)).body.surfaces;
    expect(surfaces).toHaveLength(1);
    expect(surfaces[0]).toMatchObject({ name: DEMO_SURFACE_NAME, status: 'queued', pointCount: DEMO_CUSTOMER_COUNT });
    expect(surfaces[0].params).toMatchObject({ kernel: 'quartic', bandwidth: { mode: 'rule', rule: 'normal-reference' }, studyArea: { type: 'extent' }, unit: 'km2' });
    expect(surfaces[0].costCredits).toBeGreaterThanOrEqual(1);
    await ds.surfaceRunner.start();
    const done = await surfaceWait(
      async () => (await analyst.get(`${base}/surfaces/${surfaces[0].id}`).expect(200)).body.surface,
      (x) => x.status === 'succeeded' || x.status === 'failed',
    );
    expect(done.error).toBeNull();
    expect(done.status).toBe('succeeded');
  });
});

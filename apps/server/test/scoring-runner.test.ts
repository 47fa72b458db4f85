import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { ScoringRunner } from '../src/jobs/scoring-runner.js';
import { loggerCreate } from '../src/logger.js';
import { ScoringRunSchema, type ScoringRun } from '../src/modules/scoring/scoring-run.entity.js';
import { SCORING_STALE_MS } from '../src/modules/scoring/scoring-run.repository.js';
import { SCORING_SITES, scoringRunWait } from './scoring-fixtures.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn } from './utils.js';

describe('scoring runner: work of stopped processes fails with a reason', { timeout: 120_000 }, () => {
  let ds: DemandscapeApp;
  let template: ScoringRun;

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = (await testUserSignedIn(ds, 'rune@larchloaf.example', 'Rune Owner')).client;
    const orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport' }).expect(201)).body.workspace.id;
    const points = demoPoints(800, 3);
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    const surfaceId = await surfaceStored(ds, { orgId, wsId, fileId }, points, 'succeeded');
    const base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    for (const s of SCORING_SITES) await owner.post(`${base}/sites`, s).expect(201);
    const id = (await owner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    await scoringRunWait(owner, `${base}/scoring-runs/${id}`, (r) => r.status === 'succeeded');
    template = await ds.orm.em.fork().findOneOrFail(ScoringRunSchema, id, { populate: ['sites', 'results'] });
  }, 240_000);
  afterAll(() => ds.close());

  /** Stores a copy of the finished run with another state and claim. */
  async function rowStored(fields: Partial<ScoringRun>): Promise<string> {
    const em = ds.orm.em.fork();
    const id = randomUUID();
    const { id: _id, createdAt: _c, updatedAt: _u, ...rest } = template;
    em.create(ScoringRunSchema, { ...rest, id, createdAt: new Date(), updatedAt: new Date(), ...fields } as never);
    await em.flush();
    return id;
  }

  const rowOf = (id: string): Promise<ScoringRun> => ds.orm.em.fork().findOneOrFail(ScoringRunSchema, id);

  it('a starting runner fails stale rows of another process and leaves fresh ones alone', async () => {
    const old = new Date(Date.now() - SCORING_STALE_MS - 5_000);
    const staleRun = await rowStored({ status: 'running', results: null, claimedBy: 'scoring:old-host:1:aaaa', heartbeatAt: old });
    const staleCheck = await rowStored({
      claimedBy: 'scoring:old-host:1:aaaa',
      heartbeatAt: old,
      stability: { status: 'running', error: null, factors: [0.5, 0.75, 1, 1.5, 2], threshold: 0, variants: [], sites: [], finishedAt: null },
    });
    const fresh = await rowStored({ status: 'queued', results: null, claimedBy: 'scoring:other-host:2:bbbb', heartbeatAt: new Date() });
    const runner = new ScoringRunner(ds.orm, { concurrency: 1, log: loggerCreate('silent') });
    await runner.start();
    const a = await rowOf(staleRun);
    expect(a).toMatchObject({ status: 'failed', claimedBy: null, error: { code: 'SERVER_RESTARTED' } });
    const b = await rowOf(staleCheck);
    expect(b.status).toBe('succeeded');
    expect(b.stability).toMatchObject({ status: 'failed', error: { code: 'SERVER_RESTARTED' } });
    expect(b.claimedBy).toBeNull();
    expect(await rowOf(fresh)).toMatchObject({ status: 'queued', claimedBy: 'scoring:other-host:2:bbbb' });
    await runner.stop();
  });

  it('a large run split by grid rows over two worker threads gives the same results as one worker', async () => {
    const runner = new ScoringRunner(ds.orm, { concurrency: 2, splitMinWork: 0, log: loggerCreate('silent') });
    await runner.start();
    const id = await rowStored({ status: 'queued', results: null, claimedBy: runner.id, heartbeatAt: new Date() });
    runner.scoreEnqueue(id);
    await runner.idle();
    const row = await ds.orm.em.fork().findOneOrFail(ScoringRunSchema, id, { populate: ['results'] });
    await runner.stop();
    expect(row.error).toBeNull();
    expect(row.status).toBe('succeeded');
    expect(row.timings).toMatchObject({ threads: 2 });
    const one = template.results!;
    const two = row.results!;
    expect(two.candidates.map((c) => c.siteId)).toEqual(one.candidates.map((c) => c.siteId));
    // Sums over the two halves of the rows equal the sums over all rows up to round-off [D].
    expect(two.totalDemand).toBeCloseTo(one.totalDemand, 8);
    two.candidates.forEach((c, k) => {
      const o = one.candidates[k];
      for (const key of ['captured', 'cannibalization', 'netNew', 'shareOfTotal', 'value'] as const) expect(c[key]).toBeCloseTo(o[key], 8);
      c.rings.forEach((r, j) => expect(r.demand).toBeCloseTo(o.rings[j].demand, 8));
      c.cannibalizedFrom.forEach((l, j) => expect(l.demand).toBeCloseTo(o.cannibalizedFrom[j].demand, 8));
      expect(c.explanation).toBe(o.explanation);
    });
  });

  it('a stopping runner fails its own unfinished work at once, with the reason', async () => {
    const runner = new ScoringRunner(ds.orm, { concurrency: 1, log: loggerCreate('silent') });
    await runner.start();
    const mine = await rowStored({ status: 'queued', results: null, claimedBy: runner.id, heartbeatAt: new Date() });
    const others = await rowStored({ status: 'running', results: null, claimedBy: 'scoring:other-host:3:cccc', heartbeatAt: new Date() });
    await runner.stop();
    const row = await rowOf(mine);
    expect(row).toMatchObject({ status: 'failed', claimedBy: null, error: { code: 'SERVER_RESTARTED' } });
    expect(row.error!.message).toMatch(/nothing was charged/);
    expect((await rowOf(others)).status).toBe('running');
  });
});

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { ormInit } from '../src/db.js';
import { SurfaceRunner } from '../src/jobs/surface-runner.js';
import { creditsBalance, creditsGrant } from '../src/modules/billing/credits.service.js';
import { mailerCreate } from '../src/modules/mail/mailer.js';
import {
  INTERRUPTED_TWICE_MESSAGE,
  surfaceClaimNext,
} from '../src/modules/surface/surface.repository.js';
import {
  customerFileStored,
  customerPointsChunksStore,
  demoPoints,
  surfaceWait,
} from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

interface SurfaceBody {
  id: string;
  status: string;
  progress: number;
  attempts: number;
  error: { code: string; message: string } | null;
  params: Record<string, unknown>;
  [key: string]: unknown;
}

const log = pino({ level: 'silent' });
const QUICK = {
  kernel: 'quartic',
  bandwidth: { mode: 'value', value: 1500 },
  studyArea: { type: 'extent' },
  unit: 'km2',
};
// About 2–10 s of exact summation on this machine: long enough to be caught running.
const SLOW = {
  kernel: 'quartic',
  bandwidth: { mode: 'value', value: 2500 },
  cellSize: 25,
  method: 'exact',
  studyArea: { type: 'extent' },
  unit: 'km2',
};

function runnerFor(ds: DemandscapeApp, staleMs = 30_000): SurfaceRunner {
  const mailer = mailerCreate(
    { transport: 'capture', smtpUrl: '', from: 'Demandscape <no-reply@demandscape.example>' },
    log,
  );
  return new SurfaceRunner(ds.orm, {
    concurrency: 1,
    pollMs: 100,
    heartbeatMs: 100,
    staleMs,
    log,
    mailer,
    publicUrl: 'http://localhost:3999',
  });
}

describe('surface runs: cancel, failure, retry, crash recovery', { timeout: 240_000 }, () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let orgId: string;
  let wsId: string;
  let base: string;
  let quickFile: string;
  let slowFile: string;
  const quickPoints = demoPoints(2000, 3);
  const get = async (id: string): Promise<SurfaceBody> =>
    (await owner.get(`${base}/surfaces/${id}`).expect(200)).body.surface;
  const create = async (body: object): Promise<SurfaceBody> =>
    (await owner.post(`${base}/surfaces`, body).expect(201)).body.surface;
  const sql = (q: string, params: unknown[] = []) =>
    ds.orm.em
      .fork()
      .getConnection()
      .execute(q, params as never[], 'all');

  beforeAll(async () => {
    ds = await testAppCreate({ RUNNER_CONCURRENCY: '1' });
    owner = (await testUserSignedIn(ds, 'ines@larchloaf.example', 'Ines Quill')).client;
    orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body
      .organization.id;
    wsId = (
      await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Old town' }).expect(201)
    ).body.workspace.id;
    base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    quickFile = await customerFileStored(ds, orgId, wsId, quickPoints);
    slowFile = await customerFileStored(ds, orgId, wsId, demoPoints(20_000, 5));
    await creditsGrant(ds.orm.em.fork(), orgId, 10_000, 'surface-tests', 'test credits');
  });
  afterAll(() => ds.close());

  it('cancels a queued run at once and releases its credits; a second cancel is a conflict', async () => {
    const before = await creditsBalance(ds.orm.em.fork(), orgId);
    const s = await create({ customerFileId: quickFile, ...QUICK });
    expect(await creditsBalance(ds.orm.em.fork(), orgId)).toBe(before - (s.costCredits as number));
    const c = (await owner.post(`${base}/surfaces/${s.id}/cancel`).expect(200)).body.surface;
    expect(c.status).toBe('cancelled');
    expect(await creditsBalance(ds.orm.em.fork(), orgId)).toBe(before);
    const again = await owner.post(`${base}/surfaces/${s.id}/cancel`).expect(409);
    expect(again.body.error.code).toBe('NOT_CANCELLABLE');
    // Retry queues it again with the same inputs; it then runs to the end.
    const r = (await owner.post(`${base}/surfaces/${s.id}/retry`).expect(200)).body.surface;
    expect(r).toMatchObject({ status: 'queued', attempts: 0, params: c.params });
    await ds.surfaceRunner.start();
    try {
      const done = await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'succeeded' || x.status === 'failed',
      );
      expect(done.status).toBe('succeeded');
    } finally {
      await ds.surfaceRunner.stop();
    }
  });

  it('cancels a running run: the worker stops and nothing overwrites the cancellation', async () => {
    const runner = runnerFor(ds);
    const s = await create({ customerFileId: slowFile, ...SLOW });
    await runner.start();
    try {
      await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'running',
      );
      expect(runner.runningIds()).toEqual([s.id]);
      const c = (await owner.post(`${base}/surfaces/${s.id}/cancel`).expect(200)).body.surface;
      expect(c.status).toBe('cancelled');
      await surfaceWait(
        async () => ({ status: runner.runningIds().length === 0 ? 'stopped' : 'running' }),
        (x) => x.status === 'stopped',
        5000,
      );
      await new Promise((r) => setTimeout(r, 500));
      expect((await get(s.id)).status).toBe('cancelled');
    } finally {
      await runner.stop();
    }
  });

  it('a run that fails in the worker keeps its inputs, tells why, e-mails the creator and can be retried', async () => {
    const fileId = await customerFileStored(ds, orgId, wsId, quickPoints);
    const s = await create({ customerFileId: fileId, ...QUICK, name: 'Broken file' });
    // The stored points vanish before the worker runs (a damaged import).
    await sql('delete from `customer_point_chunks` where `customer_file_id` = ?', [fileId]);
    await ds.surfaceRunner.start();
    try {
      const failed = await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'failed' || x.status === 'succeeded',
      );
      expect(failed.status).toBe('failed');
      expect(failed.error?.code).toBe('EMPTY_POINTS');
      expect(failed.error?.message).toMatch(/no customer points/);
      expect(failed.params).toEqual(s.params);
      expect(
        ds.mailbox.some(
          (m) =>
            m.subject === 'Demand surface failed: Broken file' &&
            m.text.includes('no customer points'),
        ),
      ).toBe(true);
      await customerPointsChunksStore(ds, fileId, quickPoints);
      await owner.post(`${base}/surfaces/${s.id}/retry`).expect(200);
      const ok = await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'succeeded' || x.status === 'failed',
      );
      expect(ok.status).toBe('succeeded');
      await owner.post(`${base}/surfaces/${s.id}/retry`).expect(409);
    } finally {
      await ds.surfaceRunner.stop();
    }
  });

  it('requeues a run whose runner died mid-run once, and it then succeeds on another runner', async () => {
    const a = runnerFor(ds, 400);
    const s = await create({ customerFileId: quickFile, ...SLOW, cellSize: 50 });
    const b = runnerFor(ds, 400);
    try {
      await a.start();
      await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'running',
      );
      await a.kill();
      await b.start();
      const done = await surfaceWait(
        () => get(s.id),
        (x) => x.status === 'succeeded' || x.status === 'failed',
      );
      expect(done.status).toBe('succeeded');
      expect(done.attempts).toBe(2);
    } finally {
      await a.kill();
      await b.stop();
    }
  });

  it('fails a run interrupted a second time with the reason, and releases its credits', async () => {
    const s = await create({ customerFileId: quickFile, ...QUICK });
    const before = await creditsBalance(ds.orm.em.fork(), orgId);
    // A claim by a runner that has since died, already on its second attempt.
    await sql(
      "update `surfaces` set `status` = 'running', `claimed_by` = 'dead-host:1:00000000', `attempts` = 2, `heartbeat_at` = ? where `id` = ?",
      [Date.now() - 60_000, s.id],
    );
    const b = runnerFor(ds, 400);
    await b.start();
    try {
      const failed = await surfaceWait(
        () => get(s.id),
        (x) => x.status !== 'running',
      );
      expect(failed.status).toBe('failed');
      expect(failed.error).toEqual({ code: 'INTERRUPTED', message: INTERRUPTED_TWICE_MESSAGE });
      expect(await creditsBalance(ds.orm.em.fork(), orgId)).toBe(
        before + (s.costCredits as number),
      );
    } finally {
      await b.stop();
    }
  });

  it('deletes a run with its results', async () => {
    const s = await create({ customerFileId: quickFile, ...QUICK });
    await owner.del(`${base}/surfaces/${s.id}`).expect(204);
    await owner.get(`${base}/surfaces/${s.id}`).expect(404);
    const events = (
      await owner.get(`/api/organizations/${orgId}/audit-events?limit=200`).expect(200)
    ).body.events as { action: string }[];
    for (const action of ['surface.create', 'surface.cancel', 'surface.retry', 'surface.delete'])
      expect(events.map((e) => e.action)).toContain(action);
  });
});

describe('surface claim', () => {
  it('two runners on one database file never claim the same row', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ds-claim-'));
    const file = join(dir, 'claim.sqlite');
    const one = await ormInit(file);
    const two = await ormInit(file);
    try {
      const conn = one.em.fork().getConnection();
      const now = Date.now();
      await conn.execute(
        "insert into `organizations` (`id`, `created_at`, `updated_at`, `name`, `slug`) values ('o', ?, ?, 'Org', 'org')",
        [now, now],
      );
      await conn.execute(
        "insert into `workspaces` (`id`, `created_at`, `updated_at`, `organization_id`, `name`) values ('w', ?, ?, 'o', 'W')",
        [now, now],
      );
      const ids: string[] = [];
      for (let k = 0; k < 40; k++) {
        const id = `s${String(k).padStart(2, '0')}`;
        ids.push(id);
        await conn.execute(
          "insert into `surfaces` (`id`, `created_at`, `updated_at`, `organization_id`, `workspace_id`, `name`, `status`, `params`, `engine_version`, `queued_at`) values (?, ?, ?, 'o', 'w', 'n', 'queued', '{}', '0.1.0', ?)",
          [id, now, now, now + k],
        );
      }
      const drain = async (orm: typeof one, runnerId: string): Promise<string[]> => {
        const got: string[] = [];
        for (;;) {
          const id = await surfaceClaimNext(orm.em.fork(), runnerId);
          if (!id) return got;
          got.push(id);
        }
      };
      const [a, b] = await Promise.all([drain(one, 'runner-a'), drain(two, 'runner-b')]);
      expect([...a, ...b].sort()).toEqual(ids);
      expect(new Set([...a, ...b]).size).toBe(40);
      const rows = (await conn.execute(
        'select `id`, `attempts`, `claimed_by` from `surfaces`',
        [],
        'all',
      )) as { id: string; attempts: number; claimed_by: string }[];
      for (const r of rows) {
        expect(r.attempts).toBe(1);
        expect(r.claimed_by).toBe(a.includes(r.id) ? 'runner-a' : 'runner-b');
      }
      // Oldest first within each runner's claims.
      expect(a).toEqual([...a].sort());
    } finally {
      await one.close(true);
      await two.close(true);
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

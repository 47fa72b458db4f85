import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { entityId } from '../src/modules/common/base.entity.js';
import { creditsBalance, creditsCharge, creditsGrant, creditsLedger, creditsPurchase, creditsRelease, creditsReserve } from '../src/modules/billing/credits.service.js';
import { InsufficientCreditsError } from '../src/modules/billing/credits.errors.js';
import { AppError } from '../src/modules/common/errors.js';
import { OrganizationSchema } from '../src/modules/organization/organization.entity.js';
import { testAppCreate } from './utils.js';

describe('credits ledger', () => {
  let ds: DemandscapeApp;

  async function orgFresh(): Promise<string> {
    const em = ds.orm.em.fork();
    const id = entityId();
    em.create(OrganizationSchema, { id, name: 'Ledger test', slug: `ledger-${id}` } as never);
    await em.flush();
    return id;
  }

  beforeAll(async () => {
    ds = await testAppCreate();
  });
  afterAll(() => ds.close());

  it('accepts exactly 5 of 20 concurrent reservations when the balance covers 5 (separate forked entity managers)', async () => {
    const orgId = await orgFresh();
    await creditsGrant(ds.orm.em.fork(), orgId, 60, 'test', 'test credits');
    const attempts = Array.from({ length: 20 }, (_, i) =>
      i % 2 === 0
        ? creditsReserve(ds.orm.em.fork(), orgId, 12, `run-${i}`)
        : ds.orm.em.fork().transactional((tem) => creditsReserve(tem, orgId, 12, `run-${i}`)),
    );
    const results = await Promise.allSettled(attempts);
    const accepted = results.filter((r) => r.status === 'fulfilled');
    const refused = results.filter((r) => r.status === 'rejected') as PromiseRejectedResult[];
    expect(accepted).toHaveLength(5);
    expect(refused).toHaveLength(15);
    for (const r of refused) expect(r.reason).toBeInstanceOf(InsufficientCreditsError);
    expect(await creditsBalance(ds.orm.em.fork(), orgId)).toBe(0);
    const { entries } = await creditsLedger(ds.orm.em.fork(), orgId, { limit: 200 });
    expect(entries.filter((e) => e.kind === 'reservation')).toHaveLength(5);
    expect(Math.min(...entries.map((e) => e.balanceAfter))).toBe(0);
  });

  it('accepts exactly 5 of 20 parallel HTTP reservation requests (test-only route, one forked entity manager per request)', async () => {
    const orgId = await orgFresh();
    await creditsGrant(ds.orm.em.fork(), orgId, 60, 'test', 'test credits');
    // Test-only app: the surface route is where production reserves credits; this isolates the ledger.
    const app = express();
    app.post('/reserve/:ref', async (req, res) => {
      try {
        res.status(201).json(await creditsReserve(ds.orm.em.fork(), orgId, 12, String(req.params.ref)));
      } catch (err) {
        const known = err as AppError;
        res.status(known.status ?? 500).json({ error: known.toBody?.() ?? { message: String(err) } });
      }
    });
    const server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    try {
      const responses = await Promise.all(Array.from({ length: 20 }, (_, i) => request(server).post(`/reserve/http-run-${i}`)));
      const statuses = responses.map((r) => r.status).sort();
      expect(statuses.filter((s) => s === 201)).toHaveLength(5);
      expect(statuses.filter((s) => s === 402)).toHaveLength(15);
      expect(responses.find((r) => r.status === 402)!.body.error).toMatchObject({ code: 'INSUFFICIENT_CREDITS', details: { balance: 0, cost: 12 } });
      expect(await creditsBalance(ds.orm.em.fork(), orgId)).toBe(0);
    } finally {
      await new Promise((resolve) => server.close(resolve));
    }
  });

  it('says what the run costs and what the balance is when credits do not cover it', async () => {
    const orgId = await orgFresh();
    await creditsGrant(ds.orm.em.fork(), orgId, 5, 'test', 'test credits');
    const err = (await creditsReserve(ds.orm.em.fork(), orgId, 12, 'run-big').catch((e: unknown) => e)) as InsufficientCreditsError;
    expect(err.status).toBe(402);
    expect(err.toBody()).toEqual({
      code: 'INSUFFICIENT_CREDITS',
      message: 'This run costs 12 credits; the balance is 5 — buy credits or use a larger cell size',
      details: { balance: 5, cost: 12 },
    });
  });

  it('charges a reservation once, releases it once, and never both', async () => {
    const orgId = await orgFresh();
    const em = ds.orm.em.fork();
    await creditsGrant(em, orgId, 30, 'test', 'test credits');
    await creditsReserve(em, orgId, 10, 'run-a');
    await creditsReserve(em, orgId, 7, 'run-b');
    expect(await creditsBalance(em, orgId)).toBe(13);
    expect(await creditsCharge(em, orgId, 'run-a')).toEqual({ cost: 10, balance: 13 });
    expect(await creditsCharge(em, orgId, 'run-a')).toEqual({ cost: 10, balance: 13 });
    expect(await creditsRelease(em, orgId, 'run-a')).toEqual({ released: 0, balance: 13 });
    expect(await creditsRelease(em, orgId, 'run-b')).toEqual({ released: 7, balance: 20 });
    expect(await creditsRelease(em, orgId, 'run-b')).toEqual({ released: 0, balance: 20 });
    await expect(creditsCharge(em, orgId, 'run-b')).rejects.toMatchObject({ status: 409, code: 'CREDITS_RELEASED' });
    await expect(creditsCharge(em, orgId, 'run-never')).rejects.toMatchObject({ status: 409, code: 'CREDITS_NOT_RESERVED' });
    await expect(creditsReserve(em, orgId, 1, 'run-a')).rejects.toMatchObject({ status: 409, code: 'CREDITS_ALREADY_RESERVED' });
  });

  it('credits a purchase ref and a grant ref only once', async () => {
    const orgId = await orgFresh();
    const em = ds.orm.em.fork();
    expect(await creditsPurchase(em, orgId, 500, 'cs_test_1', { pack: 'pack-500' })).toEqual({ added: true, balance: 500 });
    expect(await creditsPurchase(em, orgId, 500, 'cs_test_1', { pack: 'pack-500' })).toEqual({ added: false, balance: 500 });
    expect((await creditsGrant(em, orgId, 20, 'welcome', 'Welcome credits')).balance).toBe(520);
    expect((await creditsGrant(em, orgId, 20, 'welcome', 'Welcome credits')).added).toBe(false);
    const { entries, nextBefore } = await creditsLedger(em, orgId, { limit: 1 });
    expect(entries[0]).toMatchObject({ kind: 'grant', amount: 20, balanceAfter: 520, ref: 'welcome', details: { reason: 'Welcome credits' } });
    expect(nextBefore).toBe(entries[0].id);
    const older = await creditsLedger(em, orgId, { limit: 5, before: nextBefore! });
    expect(older.entries.map((e) => e.kind)).toEqual(['purchase']);
    expect(older.nextBefore).toBeNull();
  });
});

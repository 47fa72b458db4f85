import request from 'supertest';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { creditsBalance, creditsReserve } from '../src/modules/billing/credits.service.js';
import { billingTestEnv, hostedCheckoutPay, TEST_STRIPE_KEY, type BillingTestEnv } from './billing-utils.js';
import { testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

describe('billing: credits and seats through the payment stand-in', () => {
  let env: BillingTestEnv;
  let owner: TestClient;
  let orgId: string;
  let base: string;
  let creditsSessionId: string;

  beforeAll(async () => {
    env = await billingTestEnv();
    owner = (await testUserSignedIn(env.ds, 'owner@billing.example', 'Billing Owner')).client;
    orgId = (await owner.post('/api/organizations', { name: 'Harbour Loaves' }).expect(201)).body.organization.id;
    base = `/api/organizations/${orgId}/billing`;
  });
  afterAll(() => env.close());

  const balance = () => creditsBalance(env.ds.orm.em.fork(), orgId);

  it('starts a new organization with the welcome grant, one seat and no plan', async () => {
    const res = await owner.get(base).expect(200);
    expect(res.body.credits).toMatchObject({ balance: 20 });
    expect(res.body.plan).toMatchObject({ status: 'none', seatsPaid: 0 });
    expect(res.body.seats).toMatchObject({ used: 1, limit: 1, members: 1, pendingInvitations: 0 });
    expect(res.body.packs.map((p: { credits: number }) => p.credits)).toEqual([100, 500, 2000]);
    const ledger = await owner.get(`${base}/ledger`).expect(200);
    expect(ledger.body.entries).toMatchObject([{ kind: 'grant', amount: 20, balanceAfter: 20, ref: 'welcome' }]);
  });

  it('rejects an unknown pack and a missing kind with the field named', async () => {
    const bad = await owner.post(`${base}/checkout`, { kind: 'credits', pack: 'pack-7' }).expect(400);
    expect(bad.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'pack' });
    const none = await owner.post(`${base}/checkout`, {}).expect(400);
    expect(none.body.error.code).toBe('VALIDATION_FAILED');
  });

  it('declined card on the hosted page: nothing paid, no credits, no receipt', async () => {
    const { url } = (await owner.post(`${base}/checkout`, { kind: 'credits', pack: 'pack-100' }).expect(201)).body;
    const res = await hostedCheckoutPay(url, '4000 0000 0000 0002');
    expect(res.status).toBe(402);
    expect(await res.text()).toContain('Your card was declined');
    await env.fake.idle();
    expect(await balance()).toBe(20);
    expect((await owner.get(`${base}/receipts`).expect(200)).body.receipts).toEqual([]);
  });

  it('buys 500 credits through the hosted page: credits arrive once, with a receipt, an e-mail and audit entries', async () => {
    const checkout = await owner.post(`${base}/checkout`, { kind: 'credits', pack: 'pack-500' }).expect(201);
    expect(checkout.body.url).toBe(`${env.fake.url}/checkout/${checkout.body.sessionId}`);
    creditsSessionId = checkout.body.sessionId;
    const page = await fetch(checkout.body.url);
    expect(await page.text()).toContain('€60.00');
    const paid = await hostedCheckoutPay(checkout.body.url, '4242 4242 4242 4242');
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://localhost:3999/orgs/${orgId}/billing?checkout=success&session_id=${creditsSessionId}`);
    expect(await balance()).toBe(520);
    const receipts = (await owner.get(`${base}/receipts`).expect(200)).body.receipts;
    expect(receipts).toMatchObject([{ kind: 'credits', credits: 500, amount: 6000, currency: 'eur', reference: creditsSessionId }]);
    expect(env.ds.mailbox.some((m) => m.to === 'owner@billing.example' && m.subject === 'Demandscape receipt: 500 credits')).toBe(true);
    const audit = (await owner.get(`/api/organizations/${orgId}/audit-events`).expect(200)).body.events.map((e: { action: string }) => e.action);
    expect(audit).toEqual(expect.arrayContaining(['billing.checkout', 'billing.purchase']));
  });

  it('ignores the same event delivered again, also twice at once', async () => {
    const event = env.fake.events.find((e) => e.type === 'checkout.session.completed' && (e.data as { object: { id: string } }).object.id === creditsSessionId)!;
    const attempts = await Promise.all([env.fake.redeliver(String(event.id)), env.fake.redeliver(String(event.id))]);
    expect(attempts.map((a) => a.status)).toEqual([200, 200]);
    expect(await balance()).toBe(520);
    const ledger = (await owner.get(`${base}/ledger`).expect(200)).body.entries;
    expect(ledger.filter((e: { kind: string }) => e.kind === 'purchase')).toHaveLength(1);
    expect((await owner.get(`${base}/receipts`).expect(200)).body.receipts).toHaveLength(1);
  });

  it('answers a forged or unsigned webhook with 400 and changes nothing', async () => {
    const signer = new Stripe(TEST_STRIPE_KEY);
    const payload = JSON.stringify({
      id: 'evt_forged',
      object: 'event',
      type: 'checkout.session.completed',
      data: { object: { id: 'cs_test_forged', object: 'checkout.session', mode: 'payment', payment_status: 'paid', metadata: { organization_id: orgId, kind: 'credits', credits: '2000' }, amount_total: 0, currency: 'eur' } },
    });
    const forged = signer.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_the_secret' });
    const bad = await request(env.ds.app).post('/api/billing/webhook').set('content-type', 'application/json').set('stripe-signature', forged).send(payload).expect(400);
    expect(bad.body.error.code).toBe('WEBHOOK_SIGNATURE_INVALID');
    const unsigned = await request(env.ds.app).post('/api/billing/webhook').set('content-type', 'application/json').send(payload).expect(400);
    expect(unsigned.body.error.code).toBe('WEBHOOK_SIGNATURE_INVALID');
    expect(await balance()).toBe(520);
    const rows = await env.ds.orm.em.fork().getConnection().execute("select count(*) as n from billing_webhook_events where id = 'evt_forged'");
    expect(Number(rows[0].n)).toBe(0);
  });

  it('starts a 3-seat plan even when invoice.paid arrives before checkout.session.completed', async () => {
    const { url, sessionId } = (await owner.post(`${base}/checkout`, { kind: 'seats', seats: 3 }).expect(201)).body;
    env.fake.webhookUrlSet(null);
    await hostedCheckoutPay(url, '4242424242424242');
    env.fake.webhookUrlSet(env.webhookUrl);
    const completed = env.fake.events.find((e) => e.type === 'checkout.session.completed' && (e.data as { object: { id: string } }).object.id === sessionId)!;
    const invoicePaid = env.fake.events[env.fake.events.indexOf(completed) + 1];
    expect(invoicePaid.type).toBe('invoice.paid');
    await env.fake.redeliver(String(invoicePaid.id));
    await env.fake.redeliver(String(completed.id));
    await env.fake.redeliver(String(invoicePaid.id));
    const overview = (await owner.get(base).expect(200)).body;
    expect(overview.plan).toMatchObject({ status: 'active', seatsPaid: 3 });
    expect(overview.seats).toMatchObject({ limit: 3, used: 1 });
    const receipts = (await owner.get(`${base}/receipts`).expect(200)).body.receipts;
    expect(receipts.filter((r: { kind: string }) => r.kind === 'seats')).toMatchObject([{ seats: 3, amount: 3 * 3900 }]);
    const again = await owner.post(`${base}/checkout`, { kind: 'seats', seats: 4 }).expect(409);
    expect(again.body.error.code).toBe('SUBSCRIPTION_EXISTS');
  });

  it('refuses an invitation beyond the paid seats with SEATS_EXHAUSTED', async () => {
    const inv = `/api/organizations/${orgId}/invitations`;
    await owner.post(inv, { email: 'ana@billing.example', role: 'analyst' }).expect(201);
    await owner.post(inv, { email: 'pia@billing.example', role: 'planner' }).expect(201);
    const full = await owner.post(inv, { email: 'eve@billing.example', role: 'executive' }).expect(409);
    expect(full.body.error).toMatchObject({ code: 'SEATS_EXHAUSTED', message: 'All 3 paid seats are used (1 member, 2 open invitations) — add seats on the billing page first' });
  });

  it('changes the subscription quantity, never below the seats in use', async () => {
    const low = await owner.post(`${base}/seats`, { seats: 2 }).expect(409);
    expect(low.body.error).toMatchObject({ code: 'SEATS_BELOW_USED', field: 'seats' });
    const res = await owner.post(`${base}/seats`, { seats: 5 }).expect(200);
    expect(res.body.plan.seatsPaid).toBe(5);
    const subId = [...env.fake.state.subscriptions.keys()][0];
    expect((env.fake.state.subscriptions.get(subId)!.items as { data: { quantity: number }[] }).data[0].quantity).toBe(5);
    expect(env.fake.events.at(-1)!.type).toBe('customer.subscription.updated');
    const audit = (await owner.get(`/api/organizations/${orgId}/audit-events?action=billing.seats_change`).expect(200)).body.events;
    expect(audit[0].details).toEqual({ from: 3, to: 5 });
    await owner.post(`/api/organizations/${orgId}/invitations`, { email: 'eve@billing.example', role: 'executive' }).expect(201);
  });

  it('e-mails owners when a renewal fails, marks the plan past due and declines a seat increase', async () => {
    const subId = [...env.fake.state.subscriptions.keys()][0];
    const res = await fetch(`${env.fake.url}/v1/test_helpers/subscriptions/${subId}/payment_failure`, { method: 'POST', headers: { authorization: `Bearer ${TEST_STRIPE_KEY}` } });
    expect(res.status).toBe(200);
    expect(env.ds.mailbox.some((m) => m.subject === "Payment failed for Harbour Loaves's Demandscape seats")).toBe(true);
    expect((await owner.get(base).expect(200)).body.plan.status).toBe('past_due');
    const declined = await owner.post(`${base}/seats`, { seats: 7 }).expect(402);
    expect(declined.body.error.code).toBe('PAYMENT_DECLINED');
  });

  it('warns owners by e-mail once the balance drops below 10 % of the last pack', async () => {
    await creditsReserve(env.ds.orm.em.fork(), orgId, 480, 'run-low-balance');
    await new Promise((resolve) => setTimeout(resolve, 200));
    const warning = env.ds.mailbox.find((m) => m.subject === 'Harbour Loaves has 40 Demandscape credits left');
    expect(warning?.to).toBe('owner@billing.example');
    expect((await owner.get(base).expect(200)).body.credits).toMatchObject({ balance: 40, lowBalanceThreshold: 50, low: true });
  });

  it('lets only owners see billing', async () => {
    const analyst = await testUserSignedIn(env.ds, 'analyst@billing.example', 'Analyst');
    await testMembershipAdd(env.ds, orgId, analyst.userId, 'analyst');
    await analyst.client.get(base).expect(403);
    await analyst.client.post(`${base}/checkout`, { kind: 'credits', pack: 'pack-100' }).expect(403);
  });
});

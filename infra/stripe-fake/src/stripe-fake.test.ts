import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { stripeFakeStart, type StripeFake } from './stripe-fake.js';

const SECRET_KEY = 'sk_test_fake_suite';
const WEBHOOK_SECRET = 'whsec_fake_suite';

describe('stripe fake', () => {
  let fake: StripeFake;
  let stripe: Stripe;
  let receiver: Server;
  const received: { event: Stripe.Event; raw: string }[] = [];

  beforeAll(async () => {
    // The receiver verifies with the SDK's constructEvent, as the app does.
    receiver = createServer((req, res) => {
      let raw = '';
      req.on('data', (c) => (raw += c));
      req.on('end', () => {
        try {
          const event = stripe.webhooks.constructEvent(raw, String(req.headers['stripe-signature']), WEBHOOK_SECRET);
          received.push({ event, raw });
          res.writeHead(200).end('{}');
        } catch {
          res.writeHead(400).end();
        }
      });
    });
    await new Promise<void>((resolve) => receiver.listen(0, '127.0.0.1', resolve));
    const hook = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/hook`;
    fake = await stripeFakeStart({ port: 0, secretKey: SECRET_KEY, webhookSecret: WEBHOOK_SECRET, webhookUrl: hook });
    stripe = new Stripe(SECRET_KEY, { host: 'localhost', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
  });
  afterAll(async () => {
    await fake.stop();
    await new Promise((resolve) => receiver.close(resolve));
  });

  it('creates and retrieves a customer with bracket-notation metadata', async () => {
    const created = await stripe.customers.create({ email: 'owner@larchloaf.example', metadata: { organization_id: 'org-1' } });
    expect(created.id).toMatch(/^cus_/);
    const again = await stripe.customers.retrieve(created.id);
    expect(again).toMatchObject({ object: 'customer', email: 'owner@larchloaf.example', metadata: { organization_id: 'org-1' } });
  });

  it('answers an unknown id with a 404 resource_missing error the SDK understands', async () => {
    const err = await stripe.customers.retrieve('cus_missing').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: 'resource_missing', param: 'id' });
  });

  it('rejects a wrong secret key with 401', async () => {
    const other = new Stripe('sk_test_wrong', { host: 'localhost', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
    const err = await other.customers.create({}).catch((e: unknown) => e);
    expect(err).toMatchObject({ statusCode: 401 });
  });

  it('replays the same response for a repeated Idempotency-Key and refuses other parameters under it', async () => {
    const first = await stripe.customers.create({ email: 'a@larchloaf.example' }, { idempotencyKey: 'key-1' });
    const second = await stripe.customers.create({ email: 'a@larchloaf.example' }, { idempotencyKey: 'key-1' });
    expect(second.id).toBe(first.id);
    const err = await stripe.customers.create({ email: 'b@larchloaf.example' }, { idempotencyKey: 'key-1' }).catch((e: unknown) => e);
    expect(err).toMatchObject({ statusCode: 400, type: 'StripeIdempotencyError' });
  });

  it('names the bad parameter of a checkout session in bracket notation', async () => {
    const err = await stripe.checkout.sessions
      .create({ mode: 'payment', success_url: 'http://x.example/ok', line_items: [{ price_data: { currency: 'eur', unit_amount: 100, product_data: { name: 'x' } }, quantity: 0 }] })
      .catch((e: unknown) => e);
    expect(err).toMatchObject({ statusCode: 400, param: 'line_items[0][quantity]' });
  });

  it('declines card 4000 0000 0000 0002 on the hosted page and completes with 4242 4242 4242 4242, delivering a signed event', async () => {
    const session = await stripe.checkout.sessions.create({
      mode: 'payment',
      success_url: 'http://app.example/done?session={CHECKOUT_SESSION_ID}',
      line_items: [{ price_data: { currency: 'eur', unit_amount: 1500, product_data: { name: '100 credits' } }, quantity: 1 }],
      metadata: { kind: 'credits' },
    });
    expect(session.url).toBe(`${fake.url}/checkout/${session.id}`);
    const page = await fetch(session.url!);
    expect(await page.text()).toContain('€15.00');
    const declined = await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ card_number: '4000 0000 0000 0002' }), redirect: 'manual' });
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('Your card was declined');
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('unpaid');
    const paid = await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ card_number: '4242 4242 4242 4242' }), redirect: 'manual' });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://app.example/done?session=${session.id}`);
    const event = received.find((r) => r.event.type === 'checkout.session.completed')!.event;
    expect(event.id).toMatch(/^evt_/);
    expect(event.data.object).toMatchObject({ id: session.id, payment_status: 'paid', metadata: { kind: 'credits' } });
  });

  it('runs a seat subscription: checkout → invoice.paid, quantity change → updated, cancel → deleted', async () => {
    const customer = await stripe.customers.create({ email: 'owner@larchloaf.example' });
    const session = await stripe.checkout.sessions.create({
      mode: 'subscription',
      customer: customer.id,
      success_url: 'http://app.example/done',
      line_items: [{ price_data: { currency: 'eur', unit_amount: 3900, recurring: { interval: 'month' }, product_data: { name: 'Seat' } }, quantity: 3 }],
      subscription_data: { metadata: { organization_id: 'org-2' } },
    });
    await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ card_number: '4242424242424242' }), redirect: 'manual' });
    const done = await stripe.checkout.sessions.retrieve(session.id);
    expect(done.subscription).toMatch(/^sub_/);
    const types = received.map((r) => r.event.type);
    expect(types.slice(-2)).toEqual(['checkout.session.completed', 'invoice.paid']);
    const invoice = received.at(-1)!.event.data.object as unknown as { id: string; amount_paid: number };
    expect(invoice.id).toMatch(/^in_/);
    expect(invoice.amount_paid).toBe(3 * 3900);
    const sub = await stripe.subscriptions.retrieve(String(done.subscription));
    const updated = await stripe.subscriptions.update(sub.id, { items: [{ id: sub.items.data[0].id, quantity: 5 }] });
    expect(updated.items.data[0].quantity).toBe(5);
    expect(received.at(-1)!.event.type).toBe('customer.subscription.updated');
    const canceled = await stripe.subscriptions.cancel(sub.id);
    expect(canceled.status).toBe('canceled');
    expect(received.at(-1)!.event.type).toBe('customer.subscription.deleted');
  });
});

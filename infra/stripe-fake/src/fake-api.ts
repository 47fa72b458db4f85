import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { invoiceForSubscription, publicSession } from './checkout-complete.js';
import { FakeApiError, fakeId, missingObject, unixNow, type FakeState, type WireObject } from './fake-objects.js';
import { lineItemsParse, paramInteger, paramMetadata, paramString, type FormValue } from './fake-params.js';
import type { WebhookSender } from './webhook-delivery.js';

type Body = Record<string, FormValue>;

/**
 * `/v1` — the subset of the provider's REST API the app uses, with form-encoded bodies in bracket
 * notation, Bearer secret-key auth, `Idempotency-Key` replay and wire-shaped errors.
 * @param state - fake state
 * @param sender - webhook sender (subscription changes emit events)
 * @param options - secret key and the fake's own base URL (for hosted checkout links)
 * @returns the router, to mount at `/v1`
 * @example
 * app.use('/v1', fakeApiRoutes(state, sender, { secretKey: 'sk_test_local', baseUrl: 'http://localhost:3002' }));
 */
export function fakeApiRoutes(state: FakeState, sender: WebhookSender, options: { secretKey: string; baseUrl: () => string }): Router {
  const router = Router();
  const idempotent = new Map<string, { fingerprint: string; status: number; body: unknown }>();
  router.use(express.urlencoded({ extended: true, limit: '256kb' }));

  router.use((req, _res, next) => {
    const header = req.headers.authorization ?? '';
    if (!header) throw new FakeApiError(401, 'You did not provide an API key. Send it as a Bearer token in the Authorization header.');
    const key = header.startsWith('Bearer ') ? header.slice(7) : '';
    if (key !== options.secretKey) throw new FakeApiError(401, `Invalid API Key provided: ${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`);
    next();
  });

  router.use((req, res, next) => {
    const key = req.headers['idempotency-key'];
    if (req.method !== 'POST' || typeof key !== 'string' || !key) return next();
    const fingerprint = `${req.method} ${req.path} ${JSON.stringify(req.body ?? {})}`;
    const seen = idempotent.get(key);
    if (seen) {
      if (seen.fingerprint !== fingerprint) {
        throw new FakeApiError(400, `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}'.`, { type: 'idempotency_error' });
      }
      res.setHeader('Idempotent-Replayed', 'true');
      res.status(seen.status).json(seen.body);
      return;
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      idempotent.set(key, { fingerprint, status: res.statusCode, body });
      return json(body);
    };
    next();
  });

  router.post('/customers', (req, res) => {
    const body = req.body as Body;
    const customer: WireObject = {
      id: fakeId('cus'),
      object: 'customer',
      created: unixNow(),
      email: paramString(body, 'email', false) ?? null,
      name: paramString(body, 'name', false) ?? null,
      metadata: paramMetadata(body.metadata, 'metadata'),
      livemode: false,
    };
    state.customers.set(String(customer.id), customer);
    res.json(customer);
  });

  router.get('/customers/:id', (req, res) => {
    const customer = state.customers.get(req.params.id);
    if (!customer) throw missingObject('customer', req.params.id);
    res.json(customer);
  });

  router.post('/checkout/sessions', (req, res) => {
    const body = req.body as Body;
    const mode = paramString(body, 'mode', true)!;
    if (mode !== 'payment' && mode !== 'subscription') {
      throw new FakeApiError(400, `Invalid mode: must be one of payment or subscription (got '${mode}'; setup mode is not supported by this stand-in).`, { param: 'mode' });
    }
    const successUrl = paramString(body, 'success_url', true)!;
    const cancelUrl = paramString(body, 'cancel_url', false) ?? null;
    const customer = paramString(body, 'customer', false) ?? null;
    if (customer && !state.customers.has(customer)) throw new FakeApiError(400, `No such customer: '${customer}'`, { param: 'customer', code: 'resource_missing' });
    const lines = lineItemsParse(body.line_items, mode);
    const currencies = new Set(lines.map((l) => l.currency));
    if (currencies.size > 1) throw new FakeApiError(400, 'All line_items must use the same currency.', { param: 'line_items' });
    const subscriptionData = body.subscription_data;
    const subscriptionMetadata =
      typeof subscriptionData === 'object' && !Array.isArray(subscriptionData) ? paramMetadata(subscriptionData.metadata, 'subscription_data[metadata]') : {};
    const id = fakeId('cs_test');
    const total = lines.reduce((sum, l) => sum + l.unitAmount * l.quantity, 0);
    const session: WireObject = {
      id,
      object: 'checkout.session',
      mode,
      status: 'open',
      payment_status: 'unpaid',
      customer,
      customer_email: paramString(body, 'customer_email', false) ?? null,
      client_reference_id: paramString(body, 'client_reference_id', false) ?? null,
      metadata: paramMetadata(body.metadata, 'metadata'),
      success_url: successUrl,
      cancel_url: cancelUrl,
      url: `${options.baseUrl()}/checkout/${id}`,
      currency: lines[0].currency,
      amount_subtotal: total,
      amount_total: total,
      subscription: null,
      invoice: null,
      payment_intent: null,
      created: unixNow(),
      expires_at: unixNow() + 24 * 3600,
      livemode: false,
      subscription_data_metadata: subscriptionMetadata,
    };
    state.sessions.set(id, session);
    state.sessionLines.set(id, lines);
    res.json(publicSession(session));
  });

  router.get('/checkout/sessions/:id', (req, res) => {
    const session = state.sessions.get(req.params.id);
    if (!session) throw missingObject('checkout.session', req.params.id);
    res.json(publicSession(session));
  });

  router.get('/checkout/sessions/:id/line_items', (req, res) => {
    const lines = state.sessionLines.get(req.params.id);
    if (!lines) throw missingObject('checkout.session', req.params.id);
    res.json({
      object: 'list',
      has_more: false,
      data: lines.map((l) => ({ object: 'item', description: l.name, quantity: l.quantity, currency: l.currency, amount_total: l.unitAmount * l.quantity })),
    });
  });

  router.get('/subscriptions/:id', (req, res) => {
    res.json(subscriptionOrThrow(state, req.params.id));
  });

  router.post('/subscriptions/:id', async (req, res) => {
    const subscription = subscriptionOrThrow(state, req.params.id);
    if (subscription.status === 'canceled') throw new FakeApiError(400, `This subscription is canceled and cannot be updated: '${subscription.id}'.`, { param: 'id' });
    const body = req.body as Body;
    const item = (subscription.items as { data: WireObject[] }).data[0];
    let quantity: number | undefined;
    if (body.quantity !== undefined) quantity = paramInteger(body.quantity, 'quantity', 1);
    const items = body.items;
    if (items !== undefined) {
      const first = Array.isArray(items) ? items[0] : typeof items === 'object' ? (items as Record<string, FormValue>)['0'] : undefined;
      if (typeof first !== 'object' || Array.isArray(first)) throw new FakeApiError(400, 'Invalid array: items must be a list of objects.', { param: 'items' });
      if (first.id !== undefined && first.id !== item.id) throw new FakeApiError(400, `No such subscription item: '${String(first.id)}'`, { param: 'items[0][id]', code: 'resource_missing' });
      if (first.quantity !== undefined) quantity = paramInteger(first.quantity, 'items[0][quantity]', 1);
    }
    const previous: WireObject = {};
    if (quantity !== undefined && quantity !== item.quantity) {
      if (quantity > Number(item.quantity) && state.failingSubscriptions.has(String(subscription.id))) {
        throw new FakeApiError(402, 'Your card was declined.', { type: 'card_error', code: 'card_declined' });
      }
      previous.quantity = item.quantity;
      previous.items = structuredClone(subscription.items);
      item.quantity = quantity;
      subscription.quantity = quantity;
    }
    if (body.metadata !== undefined) {
      previous.metadata = subscription.metadata;
      subscription.metadata = { ...(subscription.metadata as WireObject), ...paramMetadata(body.metadata, 'metadata') };
    }
    if (Object.keys(previous).length > 0) await sender.emit('customer.subscription.updated', subscription, previous);
    res.json(subscription);
  });

  router.delete('/subscriptions/:id', async (req, res) => {
    const subscription = subscriptionOrThrow(state, req.params.id);
    if (subscription.status === 'canceled') throw new FakeApiError(400, `This subscription is already canceled: '${subscription.id}'.`, { param: 'id' });
    subscription.status = 'canceled';
    subscription.canceled_at = unixNow();
    subscription.ended_at = unixNow();
    await sender.emit('customer.subscription.deleted', subscription);
    res.json(subscription);
  });

  router.post('/test_helpers/subscriptions/:id/payment_failure', async (req, res) => {
    const subscription = subscriptionOrThrow(state, req.params.id);
    state.failingSubscriptions.add(String(subscription.id));
    const invoice = invoiceForSubscription(state, subscription, { reason: 'subscription_cycle', status: 'open' });
    const previous = { status: subscription.status };
    subscription.status = 'past_due';
    await sender.emit('invoice.payment_failed', invoice);
    await sender.emit('customer.subscription.updated', subscription, previous);
    res.json(invoice);
  });

  router.use((req) => {
    throw new FakeApiError(404, `Unrecognized request URL (${req.method}: /v1${req.path}). This local stand-in supports customers, checkout sessions and subscriptions only.`);
  });

  router.use((err: unknown, _req: Request, res: Response, _next: NextFunction) => {
    const known = err instanceof FakeApiError ? err : null;
    if (known) {
      res.status(known.status).json(known.toWire());
      return;
    }
    const parseFailed = (err as { type?: string }).type === 'entity.parse.failed';
    const fallback = new FakeApiError(parseFailed ? 400 : 500, parseFailed ? 'The request body could not be parsed.' : `Stand-in error: ${(err as Error).message}`, {
      type: parseFailed ? 'invalid_request_error' : 'api_error',
    });
    res.status(fallback.status).json(fallback.toWire());
  });
  return router;
}

function subscriptionOrThrow(state: FakeState, id: string): WireObject {
  const subscription = state.subscriptions.get(id);
  if (!subscription) throw missingObject('subscription', id);
  return subscription;
}

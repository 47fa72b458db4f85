import type { AddressInfo } from 'node:net';
import express from 'express';
import { checkoutPageRoutes } from './checkout-page.js';
import { fakeApiRoutes } from './fake-api.js';
import { fakeStateCreate, type FakeState, type WireObject } from './fake-objects.js';
import { webhookSenderCreate, type DeliveryAttempt } from './webhook-delivery.js';

/** Settings of the stand-in; the app must use the same secret key and webhook secret. */
export interface StripeFakeOptions {
  /** Port to listen on (0 picks a free one). */
  port: number;
  secretKey: string;
  webhookSecret: string;
  /** Where events go, e.g. http://localhost:3000/api/billing/webhook; null to only record them. */
  webhookUrl: string | null;
  host?: string;
  log?: (message: string) => void;
}

/** A running stand-in. */
export interface StripeFake {
  /** Base URL, e.g. http://localhost:3002 (API under /v1, hosted checkout under /checkout). */
  url: string;
  port: number;
  state: FakeState;
  /** Every event sent so far, oldest first. */
  events: WireObject[];
  deliveries: DeliveryAttempt[];
  webhookUrlSet(url: string | null): void;
  /** Sends a recorded event again (duplicate delivery). */
  redeliver(eventId: string): Promise<DeliveryAttempt>;
  /** Resolves when every queued webhook delivery has finished. */
  idle(): Promise<void>;
  stop(): Promise<void>;
}

/**
 * Starts the local payment stand-in: REST API under `/v1` in the provider's wire format, the hosted
 * test checkout page under `/checkout/:id`, and signed webhook delivery to the app.
 * @param options - port, keys and webhook URL
 * @returns the running fake
 * @example
 * const fake = await stripeFakeStart({ port: 3002, secretKey: 'sk_test_local', webhookSecret: 'whsec_local', webhookUrl: 'http://localhost:3000/api/billing/webhook' });
 */
export async function stripeFakeStart(options: StripeFakeOptions): Promise<StripeFake> {
  const state = fakeStateCreate();
  const sender = webhookSenderCreate(state, { secret: options.webhookSecret, webhookUrl: options.webhookUrl, log: options.log });
  let baseUrl = '';
  const app = express();
  app.disable('x-powered-by');
  app.use('/v1', fakeApiRoutes(state, sender, { secretKey: options.secretKey, baseUrl: () => baseUrl }));
  app.use('/checkout', checkoutPageRoutes(state, sender));
  app.get('/', (_req, res) => {
    res.type('text').send('Local payment stand-in for Demandscape: API under /v1, hosted test checkout under /checkout/:id.\n');
  });
  const server = await new Promise<import('node:http').Server>((resolve, reject) => {
    const s = app.listen(options.port, options.host ?? '127.0.0.1', (err?: Error) => (err ? reject(err) : resolve(s)));
    s.on('error', reject);
  });
  const port = (server.address() as AddressInfo).port;
  baseUrl = `http://localhost:${port}`;
  return {
    url: baseUrl,
    port,
    state,
    events: state.events,
    deliveries: sender.attempts,
    webhookUrlSet(url) {
      sender.webhookUrl = url;
    },
    redeliver: (eventId) => sender.redeliver(eventId),
    idle: () => sender.idle(),
    stop: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

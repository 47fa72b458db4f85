import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { stripeFakeStart, type StripeFake } from '@demandscape/stripe-fake';
import type { DemandscapeApp } from '../src/app.js';
import { BillingAccountSchema } from '../src/modules/billing/billing-account.entity.js';
import { billingAccountOf } from '../src/modules/billing/seats.service.js';
import { testAppCreate } from './utils.js';

export const TEST_STRIPE_KEY = 'sk_test_billing_suite';
export const TEST_WEBHOOK_SECRET = 'whsec_billing_suite';

/** The app listening on a random port, wired to a payment stand-in that delivers webhooks to it. */
export interface BillingTestEnv {
  ds: DemandscapeApp;
  fake: StripeFake;
  webhookUrl: string;
  close(): Promise<void>;
}

/**
 * Starts the payment stand-in and the app (in-memory SQLite) pointed at it; the app listens on a
 * random port so the stand-in can deliver signed webhooks over real HTTP.
 * @returns the environment
 * @example
 * const env = await billingTestEnv(); afterAll(() => env.close());
 */
export async function billingTestEnv(): Promise<BillingTestEnv> {
  const fake = await stripeFakeStart({ port: 0, secretKey: TEST_STRIPE_KEY, webhookSecret: TEST_WEBHOOK_SECRET, webhookUrl: null });
  const ds = await testAppCreate({ STRIPE_SECRET_KEY: TEST_STRIPE_KEY, STRIPE_WEBHOOK_SECRET: TEST_WEBHOOK_SECRET, STRIPE_API_PORT: String(fake.port) });
  const server: Server = await new Promise((resolve) => {
    const s = ds.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const webhookUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/billing/webhook`;
  fake.webhookUrlSet(webhookUrl);
  return {
    ds,
    fake,
    webhookUrl,
    async close() {
      await fake.stop();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await ds.close();
    },
  };
}

/**
 * Gives an organization a live plan with `seats` seats without going through checkout (status demo).
 * @param ds - the app
 * @param organizationId - the organization
 * @param seats - paid seats
 * @returns nothing
 * @example
 * await testSeatsSet(ds, orgId, 3);
 */
export async function testSeatsSet(ds: DemandscapeApp, organizationId: string, seats: number): Promise<void> {
  const em = ds.orm.em.fork();
  await billingAccountOf(em, organizationId);
  await em.nativeUpdate(BillingAccountSchema, { organization: organizationId }, { planStatus: 'demo', seatsPaid: seats });
}

/**
 * Pays on the stand-in's hosted page with a card number, as a browser form post would.
 * @param url - the hosted checkout URL
 * @param card - card number as typed
 * @returns the response (303 on success, 402 when declined)
 * @example
 * const res = await hostedCheckoutPay(url, '4242 4242 4242 4242');
 */
export function hostedCheckoutPay(url: string, card: string): Promise<Response> {
  return fetch(url, { method: 'POST', body: new URLSearchParams({ card_number: card }), redirect: 'manual' });
}

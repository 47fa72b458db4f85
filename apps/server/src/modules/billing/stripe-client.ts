import Stripe from 'stripe';
import type { AppConfig } from '../../config.js';
import { AppError } from '../common/errors.js';

/**
 * The payment provider's official SDK, pointed by configuration at the real API or at the local
 * stand-in (`STRIPE_API_HOST` / `STRIPE_API_PORT` / `STRIPE_API_PROTOCOL`).
 * @param billing - billing configuration
 * @returns an SDK client
 * @example
 * const stripe = stripeClientCreate(config.billing);
 */
export function stripeClientCreate(billing: AppConfig['billing']): Stripe {
  return new Stripe(billing.secretKey, {
    ...(billing.apiHost ? { host: billing.apiHost } : {}),
    ...(billing.apiPort ? { port: billing.apiPort } : {}),
    ...(billing.apiProtocol ? { protocol: billing.apiProtocol } : {}),
    maxNetworkRetries: 1,
    timeout: 20_000,
    appInfo: { name: 'Demandscape' },
  });
}

/**
 * Runs one provider call and turns its failures into API errors: a declined card → 402
 * PAYMENT_DECLINED, anything else → 502 PAYMENT_PROVIDER_ERROR (logged by nobody; the message says what to do).
 * @param call - the SDK call
 * @returns its result
 * @example
 * const session = await providerCall(() => stripe.checkout.sessions.create(params));
 */
export async function providerCall<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof Stripe.errors.StripeCardError) {
      throw new AppError(402, 'PAYMENT_DECLINED', `The payment provider declined the card on file (${err.message}) — update the card, then try again.`);
    }
    if (err instanceof Stripe.errors.StripeError) {
      throw new AppError(502, 'PAYMENT_PROVIDER_ERROR', `The payment provider refused the request (${err.message}). Nothing was charged; try again in a minute.`);
    }
    throw err;
  }
}

/**
 * 503 when payments are not configured (production without STRIPE_SECRET_KEY).
 * @param billing - billing configuration
 * @returns nothing
 * @throws AppError 503 BILLING_NOT_CONFIGURED
 * @example
 * billingEnabledAssert(config.billing);
 */
export function billingEnabledAssert(billing: AppConfig['billing']): void {
  if (!billing.enabled) {
    throw new AppError(503, 'BILLING_NOT_CONFIGURED', 'Payments are not set up on this server: set STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET and restart.');
  }
}

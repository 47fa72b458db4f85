import type { StripeFake } from '@demandscape/stripe-fake';
import type { AppConfig } from '../config.js';

export type { StripeFake };

/**
 * Starts the local payment stand-in (infra/stripe-fake) on STRIPE_API_PORT with the server's keys,
 * delivering webhooks to this server. Loaded lazily so production never imports it.
 * @param config - server configuration (billing settings point at the stand-in)
 * @returns the running fake, or undefined when its port is taken (a warning is printed)
 * @example
 * const fake = await stripeFakeLocalStart(config);
 */
export async function stripeFakeLocalStart(config: AppConfig): Promise<StripeFake | undefined> {
  const { stripeFakeStart } = await import('@demandscape/stripe-fake');
  try {
    return await stripeFakeStart({
      port: config.billing.apiPort ?? 3002,
      secretKey: config.billing.secretKey,
      webhookSecret: config.billing.webhookSecret,
      webhookUrl: `http://localhost:${config.port}/api/billing/webhook`,
      log: (message) => console.warn(`payment stand-in: ${message}`),
    });
  } catch (err) {
    console.warn(`Payment stand-in not started (${(err as Error).message}); is another one already running on port ${config.billing.apiPort}?`);
    return undefined;
  }
}

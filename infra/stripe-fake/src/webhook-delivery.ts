import Stripe from 'stripe';
import { fakeId, unixNow, type FakeState, type WireObject } from './fake-objects.js';

/** One attempt to deliver an event to the app. */
export interface DeliveryAttempt {
  eventId: string;
  type: string;
  status: number | 'network-error';
}

/** Creates, signs and posts events, one at a time and in order. */
export interface WebhookSender {
  /** Records an event and queues its delivery; resolves once this event has been delivered (or given up). */
  emit(type: string, object: WireObject, previousAttributes?: WireObject): Promise<WireObject>;
  /** Posts an already recorded event again (the provider may deliver an event more than once). */
  redeliver(eventId: string): Promise<DeliveryAttempt>;
  attempts: DeliveryAttempt[];
  webhookUrl: string | null;
  /** Resolves when every queued delivery has finished. */
  idle(): Promise<void>;
}

/**
 * The event sender: signs each payload with the webhook secret through the official SDK's own
 * test-header helper, so the app verifies it exactly as it would verify the real provider's.
 * @param state - fake state (events are appended to `state.events`)
 * @param options - webhook secret, initial URL, retries, logger
 * @returns the sender
 * @example
 * const sender = webhookSenderCreate(state, { secret: 'whsec_local', webhookUrl: 'http://localhost:3000/api/billing/webhook' });
 */
export function webhookSenderCreate(
  state: FakeState,
  options: { secret: string; webhookUrl: string | null; retries?: number; log?: (message: string) => void },
): WebhookSender {
  const signer = new Stripe('sk_test_signer_only');
  const retries = options.retries ?? 2;
  let queue: Promise<unknown> = Promise.resolve();

  async function post(event: WireObject): Promise<DeliveryAttempt> {
    const attempt: DeliveryAttempt = { eventId: String(event.id), type: String(event.type), status: 'network-error' };
    if (!sender.webhookUrl) return attempt;
    const payload = JSON.stringify(event);
    for (let i = 0; i <= retries; i++) {
      const header = signer.webhooks.generateTestHeaderString({ payload, secret: options.secret });
      try {
        const res = await fetch(sender.webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
        await res.arrayBuffer();
        attempt.status = res.status;
        if (res.ok) break;
      } catch {
        attempt.status = 'network-error';
      }
      await new Promise((resolve) => setTimeout(resolve, 100 * (i + 1)));
    }
    sender.attempts.push(attempt);
    if (attempt.status !== 200) options.log?.(`webhook ${attempt.type} (${attempt.eventId}) not accepted: ${attempt.status}`);
    return attempt;
  }

  function enqueue<T>(task: () => Promise<T>): Promise<T> {
    const run = queue.then(task, task);
    queue = run.catch(() => undefined);
    return run;
  }

  const sender: WebhookSender = {
    attempts: [],
    webhookUrl: options.webhookUrl,
    emit(type, object, previousAttributes) {
      const event: WireObject = {
        id: fakeId('evt'),
        object: 'event',
        api_version: '2026-10-28.endive',
        created: unixNow(),
        livemode: false,
        pending_webhooks: 1,
        request: { id: null, idempotency_key: null },
        type,
        data: { object: structuredClone(object), ...(previousAttributes ? { previous_attributes: previousAttributes } : {}) },
      };
      state.events.push(event);
      return enqueue(() => post(event)).then(() => event);
    },
    redeliver(eventId) {
      const event = state.events.find((e) => e.id === eventId);
      if (!event) return Promise.reject(new Error(`no event ${eventId} was sent by this fake`));
      return enqueue(() => post(event));
    },
    idle: () => queue.then(() => undefined),
  };
  return sender;
}

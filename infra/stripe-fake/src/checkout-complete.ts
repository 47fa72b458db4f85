import { fakeId, unixNow, type FakeState, type WireObject } from './fake-objects.js';
import type { WebhookSender } from './webhook-delivery.js';

/**
 * Creates a subscription object (status active, one item) for a paid subscription-mode session.
 * @param state - fake state
 * @param session - the checkout session
 * @returns the subscription
 * @example
 * const sub = subscriptionFromSession(state, session);
 */
function subscriptionFromSession(state: FakeState, session: WireObject): WireObject {
  const line = state.sessionLines.get(String(session.id))![0];
  const now = unixNow();
  const periodEnd = now + 30 * 86400;
  const id = fakeId('sub');
  const subscription: WireObject = {
    id,
    object: 'subscription',
    customer: session.customer,
    status: 'active',
    created: now,
    start_date: now,
    cancel_at_period_end: false,
    canceled_at: null,
    ended_at: null,
    currency: line.currency,
    metadata: structuredClone((session.subscription_data_metadata as WireObject | undefined) ?? {}),
    quantity: line.quantity,
    current_period_start: now,
    current_period_end: periodEnd,
    latest_invoice: null,
    items: {
      object: 'list',
      has_more: false,
      data: [
        {
          id: fakeId('si'),
          object: 'subscription_item',
          quantity: line.quantity,
          current_period_start: now,
          current_period_end: periodEnd,
          price: {
            id: line.priceId,
            object: 'price',
            currency: line.currency,
            unit_amount: line.unitAmount,
            recurring: { interval: line.interval, interval_count: 1 },
            product_name: line.name,
          },
        },
      ],
    },
    livemode: false,
  };
  state.subscriptions.set(id, subscription);
  return subscription;
}

/**
 * A paid invoice for a subscription's current quantity.
 * @param state - fake state
 * @param subscription - the subscription
 * @param options - billing reason and status ('paid' or 'open' for a failed attempt)
 * @returns the invoice
 * @example
 * const invoice = invoiceForSubscription(state, sub, { reason: 'subscription_create', status: 'paid' });
 */
export function invoiceForSubscription(state: FakeState, subscription: WireObject, options: { reason: string; status: 'paid' | 'open' }): WireObject {
  const item = (subscription.items as { data: WireObject[] }).data[0];
  const price = item.price as { unit_amount: number; currency: string; product_name: string };
  const quantity = Number(item.quantity);
  const total = price.unit_amount * quantity;
  const id = fakeId('in');
  const invoice: WireObject = {
    id,
    object: 'invoice',
    customer: subscription.customer,
    subscription: subscription.id,
    parent: { type: 'subscription_details', subscription_details: { subscription: subscription.id, metadata: subscription.metadata } },
    status: options.status,
    billing_reason: options.reason,
    currency: price.currency,
    amount_due: total,
    amount_paid: options.status === 'paid' ? total : 0,
    amount_remaining: options.status === 'paid' ? 0 : total,
    attempt_count: 1,
    created: unixNow(),
    number: `DSF-${String(state.invoices.size + 1).padStart(4, '0')}`,
    lines: {
      object: 'list',
      has_more: false,
      data: [{ object: 'line_item', description: `${quantity} × ${price.product_name}`, quantity, amount: total, currency: price.currency }],
    },
    livemode: false,
  };
  state.invoices.set(id, invoice);
  subscription.latest_invoice = id;
  return invoice;
}

/**
 * Marks a checkout session paid and sends its events in order: `checkout.session.completed`, then
 * for subscriptions `invoice.paid`. Resolves after delivery so the redirect lands on an updated app.
 * @param state - fake state
 * @param sender - webhook sender
 * @param session - the open session
 * @returns nothing
 * @example
 * await checkoutComplete(state, sender, session);
 */
export async function checkoutComplete(state: FakeState, sender: WebhookSender, session: WireObject): Promise<void> {
  session.status = 'complete';
  session.payment_status = 'paid';
  let invoice: WireObject | null = null;
  if (session.mode === 'subscription') {
    const subscription = subscriptionFromSession(state, session);
    invoice = invoiceForSubscription(state, subscription, { reason: 'subscription_create', status: 'paid' });
    session.subscription = subscription.id;
    session.invoice = invoice.id;
  } else {
    session.payment_intent = fakeId('pi');
  }
  await sender.emit('checkout.session.completed', publicSession(session));
  if (invoice) await sender.emit('invoice.paid', invoice);
}

/**
 * The session as sent on the wire (without the fake's private bookkeeping fields).
 * @param session - stored session
 * @returns a copy without `subscription_data_metadata`
 * @example
 * res.json(publicSession(session));
 */
export function publicSession(session: WireObject): WireObject {
  const { subscription_data_metadata: _hidden, ...rest } = session;
  return rest;
}

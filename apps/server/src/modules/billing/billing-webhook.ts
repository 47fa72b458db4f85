import type { RequestHandler } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { Logger } from 'pino';
import type Stripe from 'stripe';
import type { AppConfig } from '../../config.js';
import { auditRecord } from '../audit/audit.service.js';
import { AppError } from '../common/errors.js';
import type { Mailer, OutgoingMail } from '../mail/mailer.js';
import { OrganizationSchema } from '../organization/organization.entity.js';
import { BillingAccountSchema, type BillingAccount, type PlanStatus } from './billing-account.entity.js';
import { BillingReceiptSchema } from './billing-receipt.entity.js';
import { billingPageUrl } from './billing.service.js';
import { moneyText } from './billing-plans.js';
import { ownerEmails, paymentFailedMail, receiptMail } from './billing-mails.js';
import { creditsPurchase } from './credits.service.js';
import { billingAccountOf } from './seats.service.js';
import { billingEnabledAssert } from './stripe-client.js';

/** What the app needs to apply events. */
export interface WebhookDeps {
  em: EntityManager;
  stripe: Stripe;
  billing: AppConfig['billing'];
  mailer: Mailer;
  publicUrl: string;
  log: Logger;
}

type Outcome = 'applied' | 'duplicate' | 'ignored';
type Wire = Record<string, unknown> & { id: string };

function subscriptionIdOf(event: Stripe.Event): string | null {
  const o = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith('customer.subscription.')) return String(o.id);
  if (event.type === 'checkout.session.completed') return o.mode === 'subscription' && typeof o.subscription === 'string' ? o.subscription : null;
  if (event.type === 'invoice.paid' || event.type === 'invoice.payment_failed') {
    const parent = o.parent as { subscription_details?: { subscription?: string } } | null | undefined;
    const id = parent?.subscription_details?.subscription ?? o.subscription;
    return typeof id === 'string' ? id : null;
  }
  return null;
}

function planStatusOf(status: string): PlanStatus {
  if (status === 'active' || status === 'trialing') return 'active';
  if (status === 'canceled' || status === 'incomplete_expired') return 'canceled';
  return 'past_due';
}

function subscriptionSync(account: BillingAccount, subscription: Stripe.Subscription): void {
  // A late event about an old, cancelled subscription must not replace a newer live one.
  if (account.stripeSubscriptionId && account.stripeSubscriptionId !== subscription.id && subscription.status === 'canceled') return;
  const item = subscription.items.data[0];
  const raw = subscription as unknown as { current_period_end?: number };
  const periodEnd = (item as unknown as { current_period_end?: number }).current_period_end ?? raw.current_period_end;
  account.stripeSubscriptionId = subscription.id;
  account.subscriptionItemId = item?.id ?? null;
  account.seatsPaid = item?.quantity ?? 0;
  account.planStatus = planStatusOf(subscription.status);
  account.currentPeriodEnd = periodEnd ? new Date(periodEnd * 1000) : null;
}

/**
 * Applies one verified event exactly once: the event id is inserted into `billing_webhook_events`
 * in the same transaction as its effects, so a repeated delivery finds the row and changes nothing.
 * Subscription state is read back from the provider first, so events arriving out of order all
 * converge on the provider's current state. E-mails go out after the commit.
 * @param deps - entity manager, SDK, mailer, public URL
 * @param event - an event whose signature was verified
 * @returns 'applied', 'duplicate' or 'ignored' (not for us / unknown organization)
 * @example
 * await billingEventApply(deps, stripe.webhooks.constructEvent(raw, signature, secret));
 */
export async function billingEventApply(deps: WebhookDeps, event: Stripe.Event): Promise<Outcome> {
  const subscriptionId = subscriptionIdOf(event);
  const subscription = subscriptionId ? await deps.stripe.subscriptions.retrieve(subscriptionId) : null;
  const mails: OutgoingMail[] = [];
  const em = deps.em.fork();
  const outcome = await em.transactional(async (tem): Promise<Outcome> => {
    const fresh = (await tem
      .getConnection()
      .execute('insert or ignore into `billing_webhook_events` (`id`, `type`, `received_at`) values (?, ?, ?) returning `id`', [event.id, event.type, Date.now()], 'all', tem.getTransactionContext())) as unknown[];
    if (fresh.length === 0) return 'duplicate';
    const object = event.data.object as unknown as Wire;
    const account = await accountFor(tem, object);
    if (!account) return 'ignored';
    const orgId = account.organization.id;
    const org = await tem.findOneOrFail(OrganizationSchema, orgId);
    const owners = await ownerEmails(tem, orgId);
    const billingUrl = billingPageUrl(deps.publicUrl, orgId);
    if (subscription) subscriptionSync(account, subscription);

    if (event.type === 'checkout.session.completed') {
      const session = object as unknown as Stripe.Checkout.Session;
      if (session.customer && !account.stripeCustomerId) account.stripeCustomerId = String(session.customer);
      const metadata = session.metadata ?? {};
      if (session.mode === 'payment' && session.payment_status === 'paid' && metadata.kind === 'credits') {
        const credits = Number(metadata.credits);
        if (!Number.isInteger(credits) || credits <= 0) throw new Error(`checkout session ${session.id} has no valid credits metadata`);
        const { added } = await creditsPurchase(tem, orgId, credits, session.id, { pack: metadata.pack, amount: session.amount_total, currency: session.currency });
        if (added) {
          account.lastPurchaseCredits = credits;
          const description = `${credits.toLocaleString('en-GB')} credits`;
          tem.create(BillingReceiptSchema, {
            organization: tem.getReference(OrganizationSchema, orgId),
            kind: 'credits',
            description,
            amount: session.amount_total ?? 0,
            currency: session.currency ?? 'eur',
            credits,
            seats: null,
            providerRef: session.id,
          } as never);
          auditRecord(tem, { action: 'billing.purchase', organizationId: orgId, target: { type: 'checkout', id: session.id }, details: { kind: 'credits', credits, amount: session.amount_total } });
          for (const to of owners) mails.push(receiptMail(to, org.name, description, moneyText(session.amount_total ?? 0, session.currency ?? 'eur'), billingUrl));
        }
      }
    } else if (event.type === 'invoice.paid') {
      const invoice = object as unknown as Stripe.Invoice;
      const known = await tem.count(BillingReceiptSchema, { providerRef: invoice.id });
      if (!known && (invoice.amount_paid ?? 0) > 0) {
        const seats = invoice.lines?.data?.[0]?.quantity ?? account.seatsPaid;
        const description = `${seats} seat${seats === 1 ? '' : 's'}, monthly plan`;
        tem.create(BillingReceiptSchema, {
          organization: tem.getReference(OrganizationSchema, orgId),
          kind: 'seats',
          description,
          amount: invoice.amount_paid,
          currency: invoice.currency,
          credits: null,
          seats,
          providerRef: invoice.id,
        } as never);
        auditRecord(tem, { action: 'billing.purchase', organizationId: orgId, target: { type: 'invoice', id: invoice.id! }, details: { kind: 'seats', seats, amount: invoice.amount_paid } });
        for (const to of owners) mails.push(receiptMail(to, org.name, description, moneyText(invoice.amount_paid, invoice.currency), billingUrl));
      }
    } else if (event.type === 'invoice.payment_failed') {
      const invoice = object as unknown as Stripe.Invoice;
      for (const to of owners) mails.push(paymentFailedMail(to, org.name, moneyText(invoice.amount_due, invoice.currency), billingUrl));
    }
    return 'applied';
  });
  for (const mail of mails) await deps.mailer.send(mail);
  return outcome;
}

async function accountFor(em: EntityManager, object: Wire): Promise<BillingAccount | null> {
  const customer = typeof object.customer === 'string' ? object.customer : null;
  if (customer) {
    const byCustomer = await em.findOne(BillingAccountSchema, { stripeCustomerId: customer });
    if (byCustomer) return byCustomer;
  }
  // A session carries our organization id; trust it only because the event's signature was verified.
  const metadata = (object.metadata ?? {}) as Record<string, string>;
  const orgId = metadata.organization_id;
  if (!orgId || !(await em.count(OrganizationSchema, { id: orgId }))) return null;
  return billingAccountOf(em, orgId);
}

/**
 * `POST /api/billing/webhook`: verifies the `Stripe-Signature` over the raw body with the webhook
 * secret (400 WEBHOOK_SIGNATURE_INVALID, nothing changed, when it does not match), then applies the
 * event once. Mounted before the JSON parser, sessions and CSRF.
 * @param deps - entity manager, SDK, billing config, mailer
 * @returns the handler (expects `express.raw` before it)
 * @example
 * app.post('/api/billing/webhook', express.raw({ type: '*\/*' }), billingWebhookHandler(deps));
 */
export function billingWebhookHandler(deps: WebhookDeps): RequestHandler {
  return async (req, res) => {
    billingEnabledAssert(deps.billing);
    const signature = req.headers['stripe-signature'];
    if (typeof signature !== 'string' || !signature) throw new AppError(400, 'WEBHOOK_SIGNATURE_INVALID', 'The Stripe-Signature header is missing.');
    if (!Buffer.isBuffer(req.body)) throw new AppError(400, 'WEBHOOK_SIGNATURE_INVALID', 'The webhook body is empty.');
    let event: Stripe.Event;
    try {
      event = deps.stripe.webhooks.constructEvent(req.body, signature, deps.billing.webhookSecret);
    } catch (err) {
      throw new AppError(400, 'WEBHOOK_SIGNATURE_INVALID', `The webhook signature does not match (${(err as Error).message}); check STRIPE_WEBHOOK_SECRET.`);
    }
    const outcome = await billingEventApply(deps, event);
    deps.log.info({ eventId: event.id, type: event.type, outcome }, 'billing webhook');
    res.json({ received: true, outcome });
  };
}

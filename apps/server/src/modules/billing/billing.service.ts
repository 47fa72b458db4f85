import type { EntityManager } from '@mikro-orm/sqlite';
import type Stripe from 'stripe';
import { auditRecord } from '../audit/audit.service.js';
import { ConflictError } from '../common/errors.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import { BillingReceiptSchema } from './billing-receipt.entity.js';
import { CREDIT_PACKS, SEAT_PLAN, SEATS_MAX, creditPackById, lowBalanceThreshold, type CreditPackId } from './billing-plans.js';
import { creditsBalance } from './credits.service.js';
import { billingAccountOf, planIsLive, seatsUsage } from './seats.service.js';
import { providerCall } from './stripe-client.js';

/** What `GET …/billing` returns. */
export interface BillingOverview {
  seatPlan: typeof SEAT_PLAN;
  plan: { status: string; seatsPaid: number; currentPeriodEnd: string | null };
  seats: { used: number; limit: number; members: number; pendingInvitations: number };
  credits: { balance: number; lowBalanceThreshold: number; low: boolean };
  packs: typeof CREDIT_PACKS;
}

/**
 * Plan, seats, credit balance and the packs on sale.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns the overview
 * @example
 * res.json(await billingOverview(em, orgId));
 */
export async function billingOverview(em: EntityManager, organizationId: string): Promise<BillingOverview> {
  const account = await billingAccountOf(em, organizationId);
  const usage = await seatsUsage(em, organizationId);
  const balance = await creditsBalance(em, organizationId);
  const threshold = lowBalanceThreshold(account.lastPurchaseCredits);
  return {
    seatPlan: SEAT_PLAN,
    plan: { status: account.planStatus, seatsPaid: account.seatsPaid, currentPeriodEnd: account.currentPeriodEnd ? new Date(account.currentPeriodEnd).toISOString() : null },
    seats: { used: usage.used, limit: usage.limit, members: usage.members, pendingInvitations: usage.pendingInvitations },
    credits: { balance, lowBalanceThreshold: threshold, low: balance < threshold },
    packs: CREDIT_PACKS,
  };
}

/** Where the hosted checkout sends the owner back to. */
export function billingPageUrl(publicUrl: string, organizationId: string): string {
  return `${publicUrl}/orgs/${organizationId}/billing`;
}

async function customerEnsure(em: EntityManager, stripe: Stripe, org: Organization, actor: User): Promise<string> {
  const account = await billingAccountOf(em, org.id);
  if (account.stripeCustomerId) return account.stripeCustomerId;
  const customer = await providerCall(() =>
    stripe.customers.create({ name: org.name, email: actor.email, metadata: { organization_id: org.id } }, { idempotencyKey: `demandscape-customer-${org.id}` }),
  );
  account.stripeCustomerId = customer.id;
  await em.flush();
  return customer.id;
}

/** Body of `POST …/billing/checkout`. */
export type CheckoutInput = { kind: 'credits'; pack: CreditPackId } | { kind: 'seats'; seats: number };

/**
 * Opens a hosted checkout for a credit pack (one-off payment) or the seat plan (monthly
 * subscription, quantity = seats). Credits and seats arrive with the signed webhook, not here.
 * @param em - entity manager
 * @param stripe - SDK client
 * @param publicUrl - app address for the return links
 * @param org - the organization
 * @param actor - the owner
 * @param input - pack or seats
 * @returns the hosted page URL and the session id
 * @throws ConflictError SUBSCRIPTION_EXISTS / SEATS_BELOW_USED for seat plans
 * @example
 * const { url } = await billingCheckout(em, stripe, publicUrl, org, user, { kind: 'credits', pack: 'pack-500' });
 */
export async function billingCheckout(em: EntityManager, stripe: Stripe, publicUrl: string, org: Organization, actor: User, input: CheckoutInput): Promise<{ url: string; sessionId: string }> {
  const account = await billingAccountOf(em, org.id);
  const back = billingPageUrl(publicUrl, org.id);
  const urls = { success_url: `${back}?checkout=success&session_id={CHECKOUT_SESSION_ID}`, cancel_url: `${back}?checkout=cancelled` };
  let params: Stripe.Checkout.SessionCreateParams;
  if (input.kind === 'credits') {
    const pack = creditPackById(input.pack);
    params = {
      mode: 'payment',
      line_items: [{ price_data: { currency: pack.currency, unit_amount: pack.amount, product_data: { name: `Demandscape ${pack.name}` } }, quantity: 1 }],
      metadata: { organization_id: org.id, kind: 'credits', pack: pack.id, credits: String(pack.credits) },
      ...urls,
    };
  } else {
    if (account.stripeSubscriptionId && (account.planStatus === 'active' || account.planStatus === 'past_due')) {
      throw new ConflictError('SUBSCRIPTION_EXISTS', `This organization already has a seat plan with ${account.seatsPaid} seats — change the number of seats instead (POST …/billing/seats).`, 'kind');
    }
    const usage = await seatsUsage(em, org.id);
    if (input.seats < usage.used) {
      throw new ConflictError('SEATS_BELOW_USED', `${usage.used} seats are in use — choose at least ${usage.used} seats, or remove members or revoke invitations first.`, 'seats');
    }
    params = {
      mode: 'subscription',
      line_items: [
        { price_data: { currency: SEAT_PLAN.currency, unit_amount: SEAT_PLAN.unitAmount, recurring: { interval: SEAT_PLAN.interval }, product_data: { name: SEAT_PLAN.name } }, quantity: input.seats },
      ],
      metadata: { organization_id: org.id, kind: 'seats', seats: String(input.seats) },
      subscription_data: { metadata: { organization_id: org.id } },
      ...urls,
    };
  }
  const customer = await customerEnsure(em, stripe, org, actor);
  const session = await providerCall(() => stripe.checkout.sessions.create({ ...params, customer, client_reference_id: org.id }));
  auditRecord(em, {
    action: 'billing.checkout',
    organizationId: org.id,
    actor,
    target: { type: 'checkout', id: session.id },
    details: input.kind === 'credits' ? { kind: 'credits', pack: input.pack } : { kind: 'seats', seats: input.seats },
  });
  await em.flush();
  return { url: session.url!, sessionId: session.id };
}

/**
 * Changes the number of paid seats on the live subscription (prorated by the provider); never
 * below the seats in use.
 * @param em - entity manager
 * @param stripe - SDK client
 * @param org - the organization
 * @param actor - the owner
 * @param seats - new quantity
 * @returns the updated overview
 * @throws ConflictError NO_SUBSCRIPTION / SEATS_BELOW_USED; AppError 402 PAYMENT_DECLINED
 * @example
 * await billingSeatsChange(em, stripe, org, user, 6);
 */
export async function billingSeatsChange(em: EntityManager, stripe: Stripe, org: Organization, actor: User, seats: number): Promise<BillingOverview> {
  const account = await billingAccountOf(em, org.id);
  if (!account.stripeSubscriptionId || !planIsLive(account)) {
    throw new ConflictError('NO_SUBSCRIPTION', 'This organization has no paid seat plan yet — start one with POST …/billing/checkout { kind: "seats", seats }.', 'seats');
  }
  const usage = await seatsUsage(em, org.id);
  if (seats < usage.used) {
    throw new ConflictError('SEATS_BELOW_USED', `${usage.used} seats are in use (${usage.members} members, ${usage.pendingInvitations} open invitations) — remove members or revoke invitations before going below ${usage.used}.`, 'seats');
  }
  if (seats > SEATS_MAX) throw new ConflictError('SEATS_TOO_MANY', `A plan has at most ${SEATS_MAX} seats.`, 'seats');
  const previous = account.seatsPaid;
  const subscriptionId = account.stripeSubscriptionId;
  const itemId = account.subscriptionItemId ?? (await providerCall(() => stripe.subscriptions.retrieve(subscriptionId))).items.data[0].id;
  const updated = await providerCall(() => stripe.subscriptions.update(subscriptionId, { items: [{ id: itemId, quantity: seats }], proration_behavior: 'create_prorations' }));
  // The provider's update event may already have synced these; re-read so this flush does not undo it.
  await em.refresh(account);
  account.subscriptionItemId = updated.items.data[0].id;
  account.seatsPaid = updated.items.data[0].quantity ?? seats;
  auditRecord(em, { action: 'billing.seats_change', organizationId: org.id, actor, target: { type: 'subscription', id: subscriptionId }, details: { from: previous, to: account.seatsPaid } });
  await em.flush();
  return billingOverview(em, org.id);
}

/**
 * Payments received, newest first.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns receipts
 * @example
 * const receipts = await billingReceipts(em, orgId);
 */
export async function billingReceipts(em: EntityManager, organizationId: string) {
  const rows = await em.find(BillingReceiptSchema, { organization: organizationId }, { orderBy: { createdAt: 'desc' }, limit: 500 });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    description: r.description,
    amount: r.amount,
    currency: r.currency,
    credits: r.credits,
    seats: r.seats,
    reference: r.providerRef,
    createdAt: new Date(r.createdAt).toISOString(),
  }));
}

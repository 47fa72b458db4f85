import type { EntityManager } from '@mikro-orm/sqlite';
import { ConflictError } from '../common/errors.js';
import { InvitationSchema } from '../invitation/invitation.entity.js';
import { MembershipSchema } from '../organization/membership.entity.js';
import { BillingAccountSchema, type BillingAccount } from './billing-account.entity.js';
import { SEATS_WITHOUT_PLAN } from './billing-plans.js';

/** Seats in use and available. Open invitations hold a seat, so accepting one never overshoots. */
export interface SeatUsage {
  members: number;
  pendingInvitations: number;
  used: number;
  /** Paid seats of a live plan (active, past due or the demo plan), else SEATS_WITHOUT_PLAN. */
  limit: number;
  hasPlan: boolean;
}

/**
 * An organization's billing account, created on first use.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns the account (persisted)
 * @example
 * const account = await billingAccountOf(em, orgId);
 */
export async function billingAccountOf(em: EntityManager, organizationId: string): Promise<BillingAccount> {
  const found = await em.findOne(BillingAccountSchema, { organization: organizationId });
  if (found) return found;
  const account = em.create(BillingAccountSchema, {
    organization: em.getReference('Organization', organizationId),
    stripeCustomerId: null,
    stripeSubscriptionId: null,
    subscriptionItemId: null,
    planStatus: 'none',
    seatsPaid: 0,
    currentPeriodEnd: null,
    lastPurchaseCredits: null,
  } as never) as BillingAccount;
  await em.flush();
  return account;
}

/**
 * Whether a plan status still grants its paid seats.
 * @param account - billing account
 * @returns true for active, past due and demo plans
 * @example
 * planIsLive(account);
 */
export function planIsLive(account: BillingAccount): boolean {
  return account.planStatus === 'active' || account.planStatus === 'past_due' || account.planStatus === 'demo';
}

/**
 * Seats used (members + open invitations) and the seat limit.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns the usage
 * @example
 * const { used, limit } = await seatsUsage(em, orgId);
 */
export async function seatsUsage(em: EntityManager, organizationId: string): Promise<SeatUsage> {
  const account = await billingAccountOf(em, organizationId);
  const members = await em.count(MembershipSchema, { organization: organizationId });
  const pendingInvitations = await em.count(InvitationSchema, { organization: organizationId, acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } });
  const hasPlan = planIsLive(account);
  return { members, pendingInvitations, used: members + pendingInvitations, limit: hasPlan ? account.seatsPaid : SEATS_WITHOUT_PLAN, hasPlan };
}

/**
 * 409 SEATS_EXHAUSTED unless one more seat is free.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns nothing
 * @example
 * await seatsFreeAssert(em, orgId); // before creating an invitation
 */
export async function seatsFreeAssert(em: EntityManager, organizationId: string): Promise<void> {
  const usage = await seatsUsage(em, organizationId);
  if (usage.used < usage.limit) return;
  if (!usage.hasPlan) {
    throw new ConflictError('SEATS_EXHAUSTED', `Without a seat plan an organization has ${SEATS_WITHOUT_PLAN} seat, and it is used — choose a seat plan on the billing page first`);
  }
  const open = usage.pendingInvitations > 0 ? ` (${usage.members} member${usage.members === 1 ? '' : 's'}, ${usage.pendingInvitations} open invitation${usage.pendingInvitations === 1 ? '' : 's'})` : '';
  throw new ConflictError('SEATS_EXHAUSTED', `All ${usage.limit} paid seats are used${open} — add seats on the billing page first`);
}

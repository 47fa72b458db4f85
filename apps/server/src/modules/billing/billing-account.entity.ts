import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';

/**
 * Seat plan state: `none` (never subscribed), `active`, `past_due` (a renewal failed; seats still
 * count), `canceled`, or `demo` (the seeded demo organization, not billed through the provider).
 */
export const PLAN_STATUSES = ['none', 'active', 'past_due', 'canceled', 'demo'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

/** An organization's link to the payment provider and its seat plan (one per organization). */
export interface BillingAccount extends BaseEntity {
  organization: Organization;
  stripeCustomerId: string | null;
  stripeSubscriptionId: string | null;
  subscriptionItemId: string | null;
  planStatus: PlanStatus;
  seatsPaid: number;
  currentPeriodEnd: Date | null;
  /** Credits of the most recent pack bought (the low-balance rule is relative to it). */
  lastPurchaseCredits: number | null;
}

export const BillingAccountSchema = new EntitySchema<BillingAccount>({
  name: 'BillingAccount',
  tableName: 'billing_accounts',
  properties: {
    ...baseProperties(),
    organization: { kind: '1:1', entity: 'Organization', owner: true, deleteRule: 'cascade', unique: true },
    stripeCustomerId: { type: 'string', nullable: true, unique: true },
    stripeSubscriptionId: { type: 'string', nullable: true, unique: true },
    subscriptionItemId: { type: 'string', nullable: true },
    planStatus: { type: 'string', default: 'none' },
    seatsPaid: { type: 'integer', default: 0 },
    currentPeriodEnd: { type: 'Date', nullable: true },
    lastPurchaseCredits: { type: 'integer', nullable: true },
  },
});

import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';

/** A payment that went through: a credit pack (checkout session) or a seat-plan invoice. */
export interface BillingReceipt extends BaseEntity {
  organization: Organization;
  kind: 'credits' | 'seats';
  description: string;
  /** Minor currency units (cents). */
  amount: number;
  currency: string;
  credits: number | null;
  seats: number | null;
  /** The provider's id of what was paid (checkout session or invoice); unique, so a payment is recorded once. */
  providerRef: string;
}

export const BillingReceiptSchema = new EntitySchema<BillingReceipt>({
  name: 'BillingReceipt',
  tableName: 'billing_receipts',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    kind: { type: 'string' },
    description: { type: 'string' },
    amount: { type: 'integer' },
    currency: { type: 'string' },
    credits: { type: 'integer', nullable: true },
    seats: { type: 'integer', nullable: true },
    providerRef: { type: 'string', unique: true },
  },
});

/** A webhook event id already processed (each event is applied exactly once). */
export interface BillingWebhookEvent {
  id: string;
  type: string;
  receivedAt: Date;
}

export const BillingWebhookEventSchema = new EntitySchema<BillingWebhookEvent>({
  name: 'BillingWebhookEvent',
  tableName: 'billing_webhook_events',
  properties: {
    id: { type: 'string', primary: true },
    type: { type: 'string' },
    receivedAt: { type: 'Date' },
  },
});

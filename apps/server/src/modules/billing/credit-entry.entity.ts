import { EntitySchema } from '@mikro-orm/core';
import type { Organization } from '../organization/organization.entity.js';

/**
 * Ledger entry kinds. Amounts are signed: purchase/grant/release add, reservation subtracts,
 * charge is 0 (it makes a reservation final; `details.cost` holds the credits spent).
 */
export const CREDIT_ENTRY_KINDS = ['purchase', 'grant', 'reservation', 'charge', 'release'] as const;
export type CreditEntryKind = (typeof CREDIT_ENTRY_KINDS)[number];

/** One append-only ledger row; rows are written only by `credits.service.ts` (conditional SQL inserts). */
export interface CreditEntry {
  id: number;
  organization: Organization;
  kind: CreditEntryKind;
  amount: number;
  balanceAfter: number;
  /** What the entry is about: checkout session id, run id, grant name. Unique per organization and kind. */
  ref: string;
  details: Record<string, unknown>;
  createdAt: Date;
}

export const CreditEntrySchema = new EntitySchema<CreditEntry>({
  name: 'CreditEntry',
  tableName: 'credit_entries',
  properties: {
    id: { type: 'integer', primary: true, autoincrement: true },
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    kind: { type: 'string' },
    amount: { type: 'integer' },
    balanceAfter: { type: 'integer' },
    ref: { type: 'string' },
    details: { type: 'json' },
    createdAt: { type: 'Date' },
  },
});

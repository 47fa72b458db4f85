/** Response shapes of `/api/organizations/:orgId/billing` (apps/server/API.md, "Billing"). */

export type PlanStatus = 'none' | 'active' | 'past_due' | 'canceled' | 'demo';

export type CreditPack = { id: string; name: string; credits: number; amount: number; currency: string };

export type SeatPlan = { id: string; name: string; unitAmount: number; currency: string; interval: string };

export type BillingOverview = {
  seatPlan: SeatPlan;
  plan: { status: PlanStatus; seatsPaid: number; currentPeriodEnd: string | null };
  seats: { used: number; limit: number; members: number; pendingInvitations: number };
  credits: { balance: number; lowBalanceThreshold: number; low: boolean };
  packs: CreditPack[];
};

export type CreditEntryKind = 'purchase' | 'grant' | 'reservation' | 'charge' | 'release';

export type LedgerEntry = {
  id: number;
  kind: CreditEntryKind;
  /** Signed credits: purchases, grants and releases add; reservations subtract; charges are 0. */
  amount: number;
  balanceAfter: number;
  ref: string;
  details: Record<string, unknown> | null;
  createdAt: string;
};

export type Receipt = {
  id: string;
  kind: string;
  description: string;
  /** Minor units (cents). */
  amount: number;
  currency: string;
  credits: number | null;
  seats: number | null;
  reference: string;
  createdAt: string;
};

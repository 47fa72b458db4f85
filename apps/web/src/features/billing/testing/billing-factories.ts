import type { BillingOverview, LedgerEntry } from '../types';

/**
 * A billing overview as the API returns it (invented prices; an active plan with 4 of 5 seats used).
 * @param overrides parts to replace
 * @returns the overview
 * @example createBillingOverview({ credits: { balance: 5, lowBalanceThreshold: 20, low: true } })
 */
export function createBillingOverview(overrides: Partial<BillingOverview> = {}): BillingOverview {
  return {
    seatPlan: { id: 'team-seats', name: 'Demandscape team seat', unitAmount: 3900, currency: 'eur', interval: 'month' },
    plan: { status: 'active', seatsPaid: 5, currentPeriodEnd: '2027-01-02T00:00:00.000Z' },
    seats: { used: 4, limit: 5, members: 3, pendingInvitations: 1 },
    credits: { balance: 1240, lowBalanceThreshold: 50, low: false },
    packs: [
      { id: 'pack-100', name: '100 credits', credits: 100, amount: 1500, currency: 'eur' },
      { id: 'pack-500', name: '500 credits', credits: 500, amount: 6000, currency: 'eur' },
      { id: 'pack-2000', name: '2,000 credits', credits: 2000, amount: 20000, currency: 'eur' },
    ],
    ...overrides,
  };
}

let ledgerId = 100;

/**
 * A credits ledger entry.
 * @param overrides fields to set
 * @returns the entry
 * @example createLedgerEntry({ kind: 'reservation', amount: -12, ref: 'surface:srf_1:a' })
 */
export function createLedgerEntry(overrides: Partial<LedgerEntry> = {}): LedgerEntry {
  return {
    id: ledgerId--,
    kind: 'grant',
    amount: 20,
    balanceAfter: 20,
    ref: 'welcome',
    details: { reason: 'Welcome credits' },
    createdAt: '2026-12-01T09:00:00.000Z',
    ...overrides,
  };
}

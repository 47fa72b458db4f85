/**
 * Demandscape's prices, in one place (invented amounts, EUR, minor units = cents).
 * One seat-based monthly plan (quantity = seats) and three credit packs.
 */
export const SEAT_PLAN = { id: 'team-seats', name: 'Demandscape team seat', unitAmount: 3900, currency: 'eur', interval: 'month' } as const;

/** Credit packs; `id` is what `POST …/billing/checkout { kind: 'credits', pack }` names. */
export const CREDIT_PACKS = [
  { id: 'pack-100', name: '100 credits', credits: 100, amount: 1500, currency: 'eur' },
  { id: 'pack-500', name: '500 credits', credits: 500, amount: 6000, currency: 'eur' },
  { id: 'pack-2000', name: '2,000 credits', credits: 2000, amount: 20000, currency: 'eur' },
] as const;
export type CreditPack = (typeof CREDIT_PACKS)[number];
export type CreditPackId = CreditPack['id'];
export const CREDIT_PACK_IDS = CREDIT_PACKS.map((p) => p.id) as [CreditPackId, ...CreditPackId[]];

/** Seats an organization has without a seat plan: its creator's. */
export const SEATS_WITHOUT_PLAN = 1;

/** Credits granted once to every new organization (ledger `grant`, ref `welcome`). */
export const WELCOME_CREDITS = 20;

/** Credits granted to the seeded demo organization (ledger `grant`, ref `demo-seed`). */
export const DEMO_CREDITS = 500;

/** Most seats one plan can have (a typo guard, not a business limit). */
export const SEATS_MAX = 500;

/**
 * The balance under which owners are told credits run low: below 20 credits, or below 10 % of the
 * most recent pack bought, whichever is higher.
 * @param lastPurchaseCredits - credits of the last pack bought (null if none)
 * @returns the threshold in credits
 * @example
 * lowBalanceThreshold(2000); // 200
 */
export function lowBalanceThreshold(lastPurchaseCredits: number | null): number {
  return Math.max(20, Math.ceil(0.1 * (lastPurchaseCredits ?? 0)));
}

/**
 * A pack by id.
 * @param id - e.g. 'pack-500'
 * @returns the pack
 * @example
 * creditPackById('pack-500').credits; // 500
 */
export function creditPackById(id: CreditPackId): CreditPack {
  return CREDIT_PACKS.find((p) => p.id === id)!;
}

/**
 * Formats minor units as money for e-mails and receipts.
 * @param amount - minor units (cents)
 * @param currency - ISO code, e.g. 'eur'
 * @returns e.g. '€60.00'
 * @example
 * moneyText(6000, 'eur'); // '€60.00'
 */
export function moneyText(amount: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(amount / 100);
}

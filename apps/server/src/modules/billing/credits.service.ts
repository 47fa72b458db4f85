import type { EntityManager } from '@mikro-orm/sqlite';
import { ConflictError } from '../common/errors.js';
import { lowBalanceThreshold } from './billing-plans.js';
import { CreditEntrySchema } from './credit-entry.entity.js';
import { InsufficientCreditsError } from './credits.errors.js';

// Every write is ONE conditional `INSERT … SELECT … WHERE` statement: SQLite runs a statement
// atomically under its write lock, so the balance check and the insert cannot interleave with
// another writer (in this process or another one sharing the database file).

type Row = Record<string, unknown>;

const BALANCE = '(select coalesce(sum(`amount`), 0) as `balance` from `credit_entries` where `organization_id` = ?) b';
const COLUMNS = '`credit_entries` (`organization_id`, `kind`, `amount`, `balance_after`, `ref`, `details`, `created_at`)';

function ledgerSql(em: EntityManager, sql: string, params: unknown[]): Promise<Row[]> {
  return em.getConnection().execute(sql, params as never[], 'all', em.getTransactionContext()) as Promise<Row[]>;
}

/** Called when a reservation takes the balance below the low-balance threshold. */
export type LowBalanceNotifier = (organizationId: string, balance: number, threshold: number) => void;
const notifiers = new WeakMap<object, LowBalanceNotifier>();

/**
 * Registers who hears about low balances for one ORM (the app registers the e-mail to owners).
 * @param em - any entity manager of that ORM
 * @param notifier - called (outside any transaction, after a tick) on crossing the threshold
 * @returns nothing
 * @example
 * creditsLowBalanceNotifierSet(orm.em, (orgId, balance) => void lowBalanceMail(orgId, balance));
 */
export function creditsLowBalanceNotifierSet(em: EntityManager, notifier: LowBalanceNotifier): void {
  notifiers.set(em.config, notifier);
}

/**
 * The organization's available credits (purchases + grants + releases − reservations).
 * @param em - entity manager (inside or outside a transaction)
 * @param organizationId - the organization
 * @returns whole credits, never negative
 * @example
 * const balance = await creditsBalance(em, orgId);
 */
export async function creditsBalance(em: EntityManager, organizationId: string): Promise<number> {
  const rows = await ledgerSql(em, 'select coalesce(sum(`amount`), 0) as `balance` from `credit_entries` where `organization_id` = ?', [organizationId]);
  return Number(rows[0]?.balance ?? 0);
}

async function creditsAdd(em: EntityManager, organizationId: string, kind: 'grant' | 'purchase', amount: number, ref: string, details: Row): Promise<{ added: boolean; balance: number }> {
  if (!Number.isInteger(amount) || amount <= 0) throw new Error(`credits to add must be a positive whole number (got ${amount})`);
  const rows = await ledgerSql(
    em,
    `insert or ignore into ${COLUMNS} select ?, ?, ?, b.balance + ?, ?, ?, ? from ${BALANCE} returning \`balance_after\``,
    [organizationId, kind, amount, amount, ref, JSON.stringify(details), Date.now(), organizationId],
  );
  if (rows.length === 0) return { added: false, balance: await creditsBalance(em, organizationId) };
  return { added: true, balance: Number(rows[0].balance_after) };
}

/**
 * Gives credits for free (welcome credits, demo seed, support). A `ref` is granted once per
 * organization: granting the same ref again changes nothing.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param amount - positive whole credits
 * @param ref - what the grant is, e.g. 'welcome'
 * @param reason - shown in the ledger
 * @returns whether credits were added, and the balance
 * @example
 * await creditsGrant(em, orgId, 20, 'welcome', 'Welcome credits');
 */
export function creditsGrant(em: EntityManager, organizationId: string, amount: number, ref: string, reason: string): Promise<{ added: boolean; balance: number }> {
  return creditsAdd(em, organizationId, 'grant', amount, ref, { reason });
}

/**
 * Records credits bought (called by the payment webhook). Each payment `ref` (checkout session id)
 * is credited once, however often its event arrives.
 * @param em - entity manager (the webhook's transaction)
 * @param organizationId - the organization
 * @param amount - credits of the pack
 * @param ref - the checkout session id
 * @param details - pack id, amount paid
 * @returns whether credits were added, and the balance
 * @example
 * await creditsPurchase(em, orgId, 500, 'cs_test_…', { pack: 'pack-500' });
 */
export function creditsPurchase(em: EntityManager, organizationId: string, amount: number, ref: string, details: Row): Promise<{ added: boolean; balance: number }> {
  return creditsAdd(em, organizationId, 'purchase', amount, ref, details);
}

/**
 * Holds credits for a run before it starts. Check and hold happen in one statement, so parallel
 * reservations never overdraw: with credits for 5 runs, exactly 5 of 20 concurrent calls succeed.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param amount - the run's cost in whole credits (> 0)
 * @param ref - the run id (one reservation per ref)
 * @returns the balance after the hold
 * @throws InsufficientCreditsError (402) when the balance does not cover `amount`
 * @throws ConflictError 409 CREDITS_ALREADY_RESERVED when `ref` already holds credits
 * @example
 * await creditsReserve(em, orgId, 12, run.id); // then creditsCharge or creditsRelease
 */
export async function creditsReserve(em: EntityManager, organizationId: string, amount: number, ref: string): Promise<{ balance: number }> {
  if (!Number.isInteger(amount) || amount <= 0) throw new Error(`credits to reserve must be a positive whole number (got ${amount})`);
  let rows: Row[];
  try {
    rows = await ledgerSql(
      em,
      `insert into ${COLUMNS} select ?, 'reservation', ?, b.balance - ?, ?, ?, ? from ${BALANCE} where b.balance >= ? returning \`balance_after\``,
      [organizationId, -amount, amount, ref, JSON.stringify({ cost: amount }), Date.now(), organizationId, amount],
    );
  } catch (err) {
    if (/UNIQUE constraint failed/.test((err as Error).message ?? '')) {
      throw new ConflictError('CREDITS_ALREADY_RESERVED', `Credits for ${ref} are already reserved; charge or release that reservation.`);
    }
    throw err;
  }
  if (rows.length === 0) throw new InsufficientCreditsError(await creditsBalance(em, organizationId), amount);
  const after = Number(rows[0].balance_after);
  void lowBalanceCheck(em, organizationId, after + amount, after);
  return { balance: after };
}

async function lowBalanceCheck(em: EntityManager, organizationId: string, before: number, after: number): Promise<void> {
  const notifier = notifiers.get(em.config);
  if (!notifier) return;
  const rows = await ledgerSql(em, 'select `last_purchase_credits` as `last` from `billing_accounts` where `organization_id` = ?', [organizationId]);
  const threshold = lowBalanceThreshold(rows[0]?.last == null ? null : Number(rows[0].last));
  if (before >= threshold && after < threshold) setTimeout(() => notifier(organizationId, after, threshold), 0);
}

/**
 * Makes a reservation final once the run has succeeded (writes a `charge` entry; the balance
 * already excludes the held credits). Charging the same ref again is a no-op.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param ref - the run id used in `creditsReserve`
 * @returns credits spent and the balance
 * @throws ConflictError 409 CREDITS_NOT_RESERVED (no reservation) / CREDITS_RELEASED (already released)
 * @example
 * await creditsCharge(em, orgId, run.id);
 */
export async function creditsCharge(em: EntityManager, organizationId: string, ref: string): Promise<{ cost: number; balance: number }> {
  const rows = await ledgerSql(
    em,
    `insert into ${COLUMNS} select r.organization_id, 'charge', 0, b.balance, r.ref, json_object('cost', -r.amount), ? from \`credit_entries\` r, ${BALANCE}
     where r.organization_id = ? and r.kind = 'reservation' and r.ref = ?
       and not exists (select 1 from \`credit_entries\` x where x.organization_id = r.organization_id and x.ref = r.ref and x.kind in ('charge', 'release'))
     returning \`balance_after\`, \`details\``,
    [Date.now(), organizationId, organizationId, ref],
  );
  if (rows.length > 0) return { cost: Number(JSON.parse(String(rows[0].details)).cost), balance: Number(rows[0].balance_after) };
  const settled = await settlementOf(em, organizationId, ref);
  if (settled.kind === 'charge') return { cost: settled.cost, balance: await creditsBalance(em, organizationId) };
  if (settled.kind === 'release') throw new ConflictError('CREDITS_RELEASED', `The credits held for ${ref} were already released; reserve again before charging.`);
  throw new ConflictError('CREDITS_NOT_RESERVED', `No credits are reserved for ${ref}; reserve them before charging.`);
}

/**
 * Returns held credits when a run fails, is cancelled or is lost in a restart. Safe to call more
 * than once, and a no-op after a charge.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param ref - the run id used in `creditsReserve`
 * @returns credits given back (0 when nothing was held) and the balance
 * @example
 * await creditsRelease(em, orgId, run.id);
 */
export async function creditsRelease(em: EntityManager, organizationId: string, ref: string): Promise<{ released: number; balance: number }> {
  const rows = await ledgerSql(
    em,
    `insert into ${COLUMNS} select r.organization_id, 'release', -r.amount, b.balance - r.amount, r.ref, json_object('cost', -r.amount), ? from \`credit_entries\` r, ${BALANCE}
     where r.organization_id = ? and r.kind = 'reservation' and r.ref = ?
       and not exists (select 1 from \`credit_entries\` x where x.organization_id = r.organization_id and x.ref = r.ref and x.kind in ('charge', 'release'))
     returning \`amount\`, \`balance_after\``,
    [Date.now(), organizationId, organizationId, ref],
  );
  if (rows.length > 0) return { released: Number(rows[0].amount), balance: Number(rows[0].balance_after) };
  return { released: 0, balance: await creditsBalance(em, organizationId) };
}

async function settlementOf(em: EntityManager, organizationId: string, ref: string): Promise<{ kind: 'charge' | 'release' | null; cost: number }> {
  const rows = await ledgerSql(em, "select `kind`, `details` from `credit_entries` where `organization_id` = ? and `ref` = ? and `kind` in ('charge', 'release')", [organizationId, ref]);
  if (rows.length === 0) return { kind: null, cost: 0 };
  return { kind: rows[0].kind as 'charge' | 'release', cost: Number(JSON.parse(String(rows[0].details)).cost) };
}

/** One ledger row as the API returns it. */
export interface CreditEntryView {
  id: number;
  kind: string;
  amount: number;
  balanceAfter: number;
  ref: string;
  details: Record<string, unknown>;
  createdAt: string;
}

/**
 * The ledger, newest first, paged by entry id.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param query - `limit` (1–200) and `before` (exclusive entry id)
 * @returns entries and the `before` of the next page (null on the last)
 * @example
 * const { entries, nextBefore } = await creditsLedger(em, orgId, { limit: 50 });
 */
export async function creditsLedger(em: EntityManager, organizationId: string, query: { limit: number; before?: number }): Promise<{ entries: CreditEntryView[]; nextBefore: number | null }> {
  const rows = await em.find(
    CreditEntrySchema,
    { organization: organizationId, ...(query.before !== undefined ? { id: { $lt: query.before } } : {}) },
    { orderBy: { id: 'desc' }, limit: query.limit },
  );
  const entries = rows.map((e) => ({
    id: e.id,
    kind: e.kind,
    amount: e.amount,
    balanceAfter: e.balanceAfter,
    ref: e.ref,
    details: e.details,
    createdAt: new Date(e.createdAt).toISOString(),
  }));
  return { entries, nextBefore: rows.length === query.limit ? rows[rows.length - 1].id : null };
}

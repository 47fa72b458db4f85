import type { CreditEntryKind, LedgerEntry } from '../types';
import { countText } from './money-text';

/** Plain words for each ledger entry kind. */
export const ledgerKindLabels: Record<CreditEntryKind, string> = {
  purchase: 'Purchase',
  grant: 'Grant',
  reservation: 'Reserved for a run',
  charge: 'Run finished (charged)',
  release: 'Run stopped (returned)',
};

/**
 * What a ledger entry is about, in words: the pack bought, the grant's reason, or the demand
 * surface run (its id; the run name lives with the workspace).
 * @param entry the ledger entry
 * @returns e.g. "500-credit pack", "Welcome credits", "Demand surface run srf_12ab"
 * @example ledgerReferenceText({ kind: 'grant', amount: 20, ref: 'welcome', details: { reason: 'Welcome credits' } })
 */
export function ledgerReferenceText(entry: Pick<LedgerEntry, 'kind' | 'amount' | 'ref' | 'details'>): string {
  const details = entry.details ?? {};
  if (typeof details.reason === 'string' && details.reason) return details.reason;
  if (typeof details.name === 'string' && details.name) return details.name;
  if (entry.kind === 'purchase') return `${countText(entry.amount)}-credit pack`;
  const surface = /^surface:([^:]+)/.exec(entry.ref);
  if (surface) return `Demand surface run ${surface[1]}`;
  return entry.ref;
}

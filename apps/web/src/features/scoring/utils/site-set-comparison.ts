import type { CandidateScoreJson, SiteSetJson } from '../types';

export type SiteSetComparison = {
  /** The set's members each scored alone (each as the only new site), summed. */
  alone: { captured: number; cannibalization: number; netNew: number };
  together: { captured: number; cannibalization: number; netNew: number };
  /** alone − together for captured and net new: what the members take from each other when they open together. */
  takenFromEachOther: number;
};

/**
 * Compares a set opened together with its members scored alone. Opened together, members split the
 * demand between them, so the sum of the alone figures overstates what the set adds.
 * @param set the scored set
 * @param candidates the run's candidate scores (each opened alone)
 * @returns the two sums and the overlap
 * @example siteSetComparison(set, run.results.candidates).takenFromEachOther
 */
export function siteSetComparison(set: SiteSetJson, candidates: CandidateScoreJson[]): SiteSetComparison {
  const byId = new Map(candidates.map((c) => [c.siteId, c]));
  const alone = { captured: 0, cannibalization: 0, netNew: 0 };
  for (const id of set.siteIds) {
    const c = byId.get(id);
    if (!c) continue;
    alone.captured += c.captured;
    alone.cannibalization += c.cannibalization;
    alone.netNew += c.netNew;
  }
  const together = { captured: set.captured, cannibalization: set.cannibalization, netNew: set.netNew };
  return { alone, together, takenFromEachOther: alone.captured - together.captured };
}

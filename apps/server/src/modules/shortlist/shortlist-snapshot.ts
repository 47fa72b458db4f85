import { ValidationError } from '../common/errors.js';
import { runResultsRequire, runStabilityBySite } from '../report/report-model.js';
import type { ScoringRunJson } from '../scoring/scoring.types.js';
import type { ShortlistSnapshot } from './shortlist.entity.js';

/**
 * A shortlist version's content from a succeeded scoring run: the chosen candidates in the given
 * order (1-based), each with its location, attractiveness, every score part, rank range across
 * bandwidths (when computed) and the planner's note; the run's own stores, competitors, settings,
 * unit and total of demand, and its surface facts. Later edits of sites or runs leave it unchanged.
 * @param run - the scoring run (must have succeeded)
 * @param items - chosen sites in order, each a candidate of the run, no repeats
 * @returns the snapshot to store
 * @throws AppError 409 RUN_NOT_READY; ValidationError naming `items.<k>.siteId` for a repeat or a site that is not a candidate of the run
 * @example
 * const snapshot = shortlistSnapshot(run, [{ siteId: 'c1', note: 'lease offer in hand' }, { siteId: 'c4' }]);
 */
export function shortlistSnapshot(
  run: ScoringRunJson,
  items: Array<{ siteId: string; note?: string }>,
): ShortlistSnapshot {
  const results = runResultsRequire(run);
  const scores = new Map(results.candidates.map((c) => [c.siteId, c]));
  const sites = new Map(run.sites.map((s) => [s.siteId, s]));
  const stability = runStabilityBySite(run);
  const seen = new Set<string>();
  const chosen = items.map((item, k) => {
    const field = `items.${k}.siteId`;
    if (seen.has(item.siteId))
      throw new ValidationError(
        `${field}: site ${item.siteId} is listed twice; list each site once`,
        field,
      );
    seen.add(item.siteId);
    const score = scores.get(item.siteId);
    const site = sites.get(item.siteId);
    if (!score || !site) {
      throw new ValidationError(
        `${field}: site ${item.siteId} is not a candidate of the scoring run "${run.name}"; choose sites from its ranking`,
        field,
      );
    }
    const { siteId, name, ...parts } = score;
    return {
      order: k + 1,
      siteId,
      name,
      lon: site.lon,
      lat: site.lat,
      attractiveness: site.attractiveness,
      attractivenessLabel: site.attractivenessLabel,
      note: item.note ?? '',
      score: parts,
      stability: stability.get(siteId) ?? null,
    };
  });
  const stores = (kind: 'own' | 'competitor') =>
    run.sites
      .filter((s) => s.kind === kind)
      .map((s) => ({ siteId: s.siteId, name: s.name, lon: s.lon, lat: s.lat }));
  return {
    scoringRunId: run.id,
    scoringRunName: run.name,
    surfaceId: run.surfaceId,
    surfaceName: run.surfaceName,
    settings: run.settings,
    weightLabel: run.weightLabel,
    totalDemand: results.totalDemand,
    candidateCount: results.candidates.length,
    items: chosen,
    ownStores: stores('own'),
    competitors: stores('competitor'),
    surface: run.surface,
  };
}

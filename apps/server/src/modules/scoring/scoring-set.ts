import { siteSetScore } from '@demandscape/core';
import { runSitesProjected, scoringSurfaceFromRaster, type ScoringComputeInput } from './scoring-compute.js';
import type { SiteSetJson } from './scoring.types.js';

/** A set's numbers (what the worker returns; id, name, time and creator are added by the service). */
export type SiteSetParts = Omit<SiteSetJson, 'id' | 'name' | 'createdAt' | 'createdBy'>;

/**
 * Scores candidates opened together (core `siteSetScore`): they compete with each other, with own
 * stores and with competitors. Pure: runs in a worker thread.
 * @param input the run's scoring input
 * @param siteIds candidate ids of the run
 * @returns captured, cannibalization (total and per own store), net new, share and per-member parts
 * @example
 * const parts = scoringSetCompute(input, ['c1', 'c4']);
 */
export function scoringSetCompute(input: ScoringComputeInput, siteIds: readonly string[]): SiteSetParts {
  const surface = scoringSurfaceFromRaster(input.raster, input.grid);
  const sites = runSitesProjected(input.sites, input.projection);
  const { settings } = input;
  const r = siteSetScore(surface, sites, siteIds, { alpha: settings.alpha, beta: settings.beta, radii: settings.radiiM, minDistanceM: settings.minDistanceM });
  const nameOf = new Map(input.sites.map((s) => [s.siteId, s.name]));
  return {
    siteIds: [...siteIds],
    members: r.members.map((m) => ({ siteId: m.id, name: nameOf.get(m.id) ?? m.id, captured: m.captured, shareOfTotal: m.shareOfTotal })),
    captured: r.captured,
    cannibalization: r.cannibalization,
    cannibalizedFrom: r.cannibalizedFrom.map((l) => ({ siteId: l.id, name: nameOf.get(l.id) ?? l.id, demand: l.demand })),
    netNew: r.netNew,
    shareOfTotal: r.shareOfTotal,
  };
}

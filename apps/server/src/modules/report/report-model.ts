import { AppError } from '../common/errors.js';
import type {
  ScoringRunJson,
  ScoringSettingsJson,
} from '../scoring/scoring.types.js';
import { SHORTLIST_CAUTION } from '../shortlist/shortlist-caution.js';
import type { ShortlistItemJson, ShortlistJson } from '../shortlist/shortlist.types.js';

/**
 * One candidate as a report lists it (a ranking row or a shortlist item): a shortlist item whose
 * `order` is `position` — null in a ranking — and whose `note` is the site's notes in a ranking.
 */
export type ReportSite = Omit<ShortlistItemJson, 'order'> & { position: number | null };

/** Everything a report file shows: run parameters, the caution and the sites in report order. */
export interface ReportModel {
  kind: 'ranking' | 'shortlist';
  /** Shortlist name, or the run's name for a ranking. */
  title: string;
  workspaceName: string;
  runId: string;
  runName: string;
  surfaceName: string;
  surface: { bandwidthM: number; kernel: string; cellSizeM: number; projection: string } | null;
  settings: ScoringSettingsJson & { radiiM: number[] };
  weightLabel: string;
  totalDemand: number;
  candidateCount: number;
  /** Shortlist version shown (null for a ranking). */
  version: {
    version: number;
    versionNote: string;
    createdAt: string;
    createdBy: string | null;
  } | null;
  caution: string;
  sites: ReportSite[];
  ownStores: Array<{ siteId: string; name: string; lon: number; lat: number }>;
  competitors: Array<{ siteId: string; name: string; lon: number; lat: number }>;
}

/**
 * 409 unless the run has results (exports and shortlists need a finished run).
 * @param run - the scoring run
 * @returns the results
 * @throws AppError 409 RUN_NOT_READY naming the run and its status
 * @example
 * const results = runResultsRequire(run);
 */
export function runResultsRequire(run: ScoringRunJson): NonNullable<ScoringRunJson['results']> {
  if (run.status !== 'succeeded' || !run.results) {
    throw new AppError(
      409,
      'RUN_NOT_READY',
      `Scoring run "${run.name}" is ${run.status}; only a succeeded run can be exported or shortlisted. Wait for it to finish, or start a new run.`,
      'scoringRunId',
    );
  }
  return run.results;
}

/**
 * Rank range of each candidate across the bandwidth variants, when the run's stability succeeded.
 * @param run - the scoring run
 * @returns siteId → { minRank, maxRank, unstable }
 * @example
 * const range = runStabilityBySite(run).get(siteId);
 */
export function runStabilityBySite(
  run: ScoringRunJson,
): Map<string, { minRank: number; maxRank: number; unstable: boolean }> {
  const out = new Map<string, { minRank: number; maxRank: number; unstable: boolean }>();
  if (run.stability?.status !== 'succeeded') return out;
  for (const s of run.stability.sites)
    out.set(s.siteId, { minRank: s.minRank, maxRank: s.maxRank, unstable: s.unstable });
  return out;
}

/**
 * The report model of a scoring run's whole ranking (best first).
 * @param run - a succeeded scoring run
 * @param workspaceName - its workspace's name
 * @returns the model
 * @throws AppError 409 RUN_NOT_READY when the run has no results
 * @example
 * const model = reportFromRun(await scoringRunGet(em, scope, runId), 'North corridor 2027');
 */
export function reportFromRun(run: ScoringRunJson, workspaceName: string): ReportModel {
  const results = runResultsRequire(run);
  const sitesById = new Map(run.sites.map((s) => [s.siteId, s]));
  const stability = runStabilityBySite(run);
  const stores = (kind: 'own' | 'competitor') =>
    run.sites
      .filter((s) => s.kind === kind)
      .map((s) => ({ siteId: s.siteId, name: s.name, lon: s.lon, lat: s.lat }));
  return {
    kind: 'ranking',
    title: run.name,
    workspaceName,
    runId: run.id,
    runName: run.name,
    surfaceName: run.surfaceName,
    surface: run.surface,
    settings: run.settings,
    weightLabel: run.weightLabel,
    totalDemand: results.totalDemand,
    candidateCount: results.candidates.length,
    version: null,
    caution: SHORTLIST_CAUTION,
    sites: results.candidates.map((c) => {
      const { siteId, name, ...score } = c;
      const site = sitesById.get(siteId);
      return {
        position: null,
        siteId,
        name,
        lon: site?.lon ?? Number.NaN,
        lat: site?.lat ?? Number.NaN,
        attractiveness: site?.attractiveness ?? Number.NaN,
        attractivenessLabel: site?.attractivenessLabel ?? '',
        note: site?.notes ?? '',
        score,
        stability: stability.get(siteId) ?? null,
      };
    }),
    ownStores: stores('own'),
    competitors: stores('competitor'),
  };
}

/**
 * The report model of one shortlist version (items in the planner's order).
 * @param shortlist - the shortlist with the version to report
 * @returns the model
 * @example
 * const model = reportFromShortlist(await shortlistGet(em, scope, id, 2));
 */
export function reportFromShortlist(shortlist: ShortlistJson): ReportModel {
  const v = shortlist.version;
  return {
    kind: 'shortlist',
    title: shortlist.name,
    workspaceName: shortlist.workspaceName,
    runId: v.scoringRunId,
    runName: v.scoringRunName,
    surfaceName: v.surfaceName,
    surface: v.surface ?? null,
    settings: v.settings,
    weightLabel: v.weightLabel,
    totalDemand: v.totalDemand,
    candidateCount: v.candidateCount,
    version: {
      version: v.version,
      versionNote: v.versionNote,
      createdAt: v.createdAt,
      createdBy: v.createdBy?.name ?? null,
    },
    caution: shortlist.caution,
    sites: v.items.map((i) => ({
      position: i.order,
      siteId: i.siteId,
      name: i.name,
      lon: i.lon,
      lat: i.lat,
      attractiveness: i.attractiveness,
      attractivenessLabel: i.attractivenessLabel,
      note: i.note,
      score: i.score,
      stability: i.stability,
    })),
    ownStores: v.ownStores,
    competitors: v.competitors,
  };
}

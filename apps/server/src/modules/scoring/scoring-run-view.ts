import type { ScoringRun } from './scoring-run.entity.js';
import type { ScoringRunJson, ScoringRunSummaryJson } from './scoring.types.js';

/**
 * The list shape of a run (no sites, results, stability or sets).
 * @param r the run (createdBy loaded or null)
 * @returns the summary
 * @example
 * res.json({ runs: rows.map(scoringRunSummaryJson) });
 */
export function scoringRunSummaryJson(r: ScoringRun): ScoringRunSummaryJson {
  return {
    id: r.id,
    workspaceId: r.workspace.id,
    name: r.name,
    status: r.status,
    progress: r.progress,
    error: r.error,
    surfaceId: r.surfaceId ?? '',
    surfaceName: r.surfaceName,
    settings: r.settings,
    weightLabel: r.weightLabel,
    candidateCount: r.candidateCount,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt?.toISOString() ?? null,
    createdBy: r.createdBy ? { id: r.createdBy.id, name: r.createdBy.name } : null,
  };
}

/**
 * The full shape of a run (results, stability and sets included).
 * @param r the run with `sites` and `results` loaded
 * @returns the run JSON
 * @example
 * res.json({ run: scoringRunJson(run) });
 */
export function scoringRunJson(r: ScoringRun): ScoringRunJson {
  return {
    ...scoringRunSummaryJson(r),
    sites: r.sites,
    results: r.results,
    stability: r.stability,
    sets: r.sets,
    warnings: r.warnings,
    timings: r.timings,
    surface: r.surfaceInfo,
  };
}

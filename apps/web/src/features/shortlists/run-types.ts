/**
 * The parts of a scoring run the shortlist builder reads (the scoring feature owns the full shapes in
 * its own types; features do not import each other's code, and these fields match them).
 */

export type ShortlistRunStatus = 'queued' | 'running' | 'succeeded' | 'failed';

/** A run as `GET …/scoring-runs` lists it. */
export type ShortlistRunSummary = {
  id: string;
  name: string;
  status: ShortlistRunStatus;
  surfaceId: string;
  surfaceName: string;
  weightLabel: string;
  candidateCount: number;
  createdAt: string;
  finishedAt: string | null;
  settings: { measure: string };
};

/** One ranked candidate of a finished run. */
export type ShortlistRunCandidate = {
  siteId: string;
  name: string;
  rank: number;
  value: number;
  captured: number;
  cannibalization: number;
  netNew: number;
  shareOfTotal: number;
  explanation: string;
};

/** A run with its ranking (`GET …/scoring-runs/:runId`). */
export type ShortlistRun = ShortlistRunSummary & {
  results: { totalDemand: number; candidates: ShortlistRunCandidate[] } | null;
};

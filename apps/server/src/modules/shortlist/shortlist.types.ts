import type { CandidateScoreJson, ScoringSettingsJson } from '../scoring/scoring.types.js';

/**
 * JSON shapes of shortlists as the API sends them (apps/server/API.md). A version is a snapshot:
 * it keeps its sites and scores even when the scoring run or the sites change or are deleted.
 */

export interface ShortlistItemJson {
  /** 1-based position chosen by the planner. */
  order: number;
  siteId: string;
  name: string;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel: string;
  /** The planner's note for this site in this version. */
  note: string;
  score: Omit<CandidateScoreJson, 'siteId' | 'name'>;
  stability: { minRank: number; maxRank: number; unstable: boolean } | null;
}

export interface ShortlistVersionJson {
  version: number;
  createdAt: string;
  createdBy: { id: string; name: string } | null;
  versionNote: string;
  scoringRunId: string;
  scoringRunName: string;
  surfaceId: string;
  surfaceName: string;
  settings: ScoringSettingsJson & { radiiM: number[] };
  weightLabel: string;
  totalDemand: number;
  candidateCount: number;
  items: ShortlistItemJson[];
  ownStores: Array<{ siteId: string; name: string; lon: number; lat: number }>;
  competitors: Array<{ siteId: string; name: string; lon: number; lat: number }>;
  /** The run's surface (bandwidth, kernel, cell size, projection) for reports; absent in versions saved without it. */
  surface?: { bandwidthM: number; kernel: string; cellSizeM: number; projection: string };
}

export interface ShortlistSummaryJson {
  id: string;
  workspaceId: string;
  workspaceName: string;
  name: string;
  latestVersion: number;
  itemCount: number;
  sharedAt: string | null;
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
}

export interface ShortlistJson extends ShortlistSummaryJson {
  /** The version asked for (latest by default). */
  version: ShortlistVersionJson;
  versions: Array<{ version: number; createdAt: string; createdBy: { id: string; name: string } | null; versionNote: string; itemCount: number }>;
  sharedWith: Array<{ userId: string; name: string; email: string; sharedAt: string }>;
  /** The real-estate caution shown beside every shortlist. */
  caution: string;
}

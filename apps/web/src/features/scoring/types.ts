/**
 * Scoring shapes as the API returns them (mirror of apps/server/src/modules/scoring/scoring.types.ts,
 * contract v1). Demand is in the unit of the surface's weight (`weightLabel`).
 */

export type SiteKind = 'candidate' | 'own' | 'competitor';

/** What candidates are ranked by: Huff measures, or demand inside ring k (0-based into `radii`). */
export type ScoringMeasure = 'netNew' | 'captured' | 'shareOfTotal' | 'cannibalization' | `ring:${number}`;

/** Trade-area rules of one workspace (one row; defaults until a planner saves them). */
export interface ScoringSettingsJson {
  /** Huff attractiveness exponent α (0.1–5, default 1). */
  alpha: number;
  /** Huff distance-decay exponent β (0.5–5, default 2). */
  beta: number;
  /** Ring radii in `radiusUnit` (1–5 values, ascending, each > 0 and ≤ 50 km). */
  radii: number[];
  radiusUnit: 'km' | 'mi';
  measure: ScoringMeasure;
  /** Smallest store–cell distance the Huff model uses, metres (guards d → 0); null = half a cell. */
  minDistanceM: number | null;
  /** True until a planner saves settings for the workspace. */
  isDefault: boolean;
  updatedAt: string | null;
  updatedBy: { id: string; name: string } | null;
}

/** A site as the run saw it (snapshot: later edits do not change a finished run). */
export interface RunSiteJson {
  siteId: string;
  name: string;
  kind: SiteKind;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel: string;
  notes: string;
}

export interface StoreDemandJson {
  siteId: string;
  name: string;
  demand: number;
}

/** One ring trade area: radius in metres and the demand inside it. */
export interface RingJson {
  radiusM: number;
  demand: number;
}

/** One candidate's score and the parts that explain it. */
export interface CandidateScoreJson {
  siteId: string;
  name: string;
  /** 1 … n, no shared places (ties broken by site id). */
  rank: number;
  /** The value of the run's ranking measure. */
  value: number;
  captured: number;
  cannibalization: number;
  cannibalizedFrom: StoreDemandJson[];
  netNew: number;
  shareOfTotal: number;
  rings: RingJson[];
  /** Plain-words sentence(s) saying why the site ranks where it does (server-made, used by UI and exports). */
  explanation: string;
}

export interface ScoringResultsJson {
  totalDemand: number;
  /** Demand each own store holds today (before any candidate opens). */
  ownToday: StoreDemandJson[];
  /** Sorted by rank (best first). */
  candidates: CandidateScoreJson[];
}

export interface StabilityJson {
  status: 'running' | 'succeeded' | 'failed';
  error: { code: string; message: string } | null;
  /** Bandwidth multipliers, including 1 (the run's surface). */
  factors: number[];
  /** A site is flagged when its rank moves by more than this many places. */
  threshold: number;
  variants: Array<{ factor: number; bandwidthM: number; tau: number }>;
  sites: Array<{ siteId: string; name: string; baseRank: number; minRank: number; maxRank: number; maxShift: number; unstable: boolean; ranks: number[] }>;
  finishedAt: string | null;
}

/** Candidates opened together (they compete with each other too). */
export interface SiteSetJson {
  id: string;
  name: string;
  siteIds: string[];
  members: Array<{ siteId: string; name: string; captured: number; shareOfTotal: number }>;
  captured: number;
  cannibalization: number;
  cannibalizedFrom: StoreDemandJson[];
  netNew: number;
  shareOfTotal: number;
  createdAt: string;
  createdBy: { id: string; name: string } | null;
}

export type ScoringRunStatus = 'queued' | 'running' | 'succeeded' | 'failed';

/** A scoring run without its results (lists). */
export interface ScoringRunSummaryJson {
  id: string;
  workspaceId: string;
  name: string;
  status: ScoringRunStatus;
  progress: number;
  error: { code: string; message: string } | null;
  surfaceId: string;
  surfaceName: string;
  /** Settings used, with radii converted to metres in `radiiM`. */
  settings: ScoringSettingsJson & { radiiM: number[] };
  /** What one unit of demand is (e.g. "customers" or "annual spend"). */
  weightLabel: string;
  candidateCount: number;
  createdAt: string;
  finishedAt: string | null;
  createdBy: { id: string; name: string } | null;
}

/** A full scoring run. */
export interface ScoringRunJson extends ScoringRunSummaryJson {
  sites: RunSiteJson[];
  results: ScoringResultsJson | null;
  stability: StabilityJson | null;
  sets: SiteSetJson[];
  /** E.g. a candidate outside the surface's grid. */
  warnings: string[];
  /** Seconds per stage. */
  timings: Record<string, number> | null;
  /** The surface's bandwidth (metres) and kernel, for explanations and reports. */
  surface: { bandwidthM: number; kernel: string; cellSizeM: number; projection: string };
}

/** The body of PUT …/scoring-settings. */
export type ScoringSettingsBody = Pick<ScoringSettingsJson, 'alpha' | 'beta' | 'radii' | 'radiusUnit' | 'measure' | 'minDistanceM'>;

/** A finished demand surface sites can be scored against (the route passes these in; features do not import each other). */
export type ScoringSurfaceOption = { id: string; name: string };

/**
 * Shortlist shapes as the API returns them (mirror of apps/server/src/modules/shortlist/shortlist.types.ts,
 * contract "Shortlists"). A version is a snapshot: it keeps its sites and scores when the run or the sites change.
 */

/** One ring trade area: radius in metres and the demand inside it. */
export type ShortlistRing = { radiusM: number; demand: number };

/** The part of a candidate's captured demand taken from one own store. */
export type ShortlistStoreDemand = { siteId: string; name: string; demand: number };

/** A candidate's score as the run computed it (the site's id and name sit on the item). */
export type ShortlistItemScore = {
  rank: number;
  /** The value of the run's ranking measure. */
  value: number;
  captured: number;
  cannibalization: number;
  cannibalizedFrom: ShortlistStoreDemand[];
  netNew: number;
  /** 0–1 share of the surface's total demand. */
  shareOfTotal: number;
  rings: ShortlistRing[];
  /** Plain-words sentence(s) from the server saying why the site ranks where it does. */
  explanation: string;
};

export type ShortlistItem = {
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
  score: ShortlistItemScore;
  stability: { minRank: number; maxRank: number; unstable: boolean } | null;
};

export type ShortlistPerson = { id: string; name: string } | null;

/** The scoring settings a version was made with (radii in the chosen unit and in metres). */
export type ShortlistSettings = {
  alpha: number;
  beta: number;
  radii: number[];
  radiusUnit: 'km' | 'mi';
  measure: string;
  minDistanceM: number | null;
  isDefault: boolean;
  updatedAt: string | null;
  updatedBy: ShortlistPerson;
  radiiM: number[];
};

export type ShortlistStore = { siteId: string; name: string; lon: number; lat: number };

export type ShortlistVersion = {
  version: number;
  createdAt: string;
  createdBy: ShortlistPerson;
  versionNote: string;
  scoringRunId: string;
  scoringRunName: string;
  surfaceId: string;
  surfaceName: string;
  settings: ShortlistSettings;
  /** What one unit of demand is (e.g. "customers" or "annual spend (€)"). */
  weightLabel: string;
  totalDemand: number;
  candidateCount: number;
  items: ShortlistItem[];
  ownStores: ShortlistStore[];
  competitors: ShortlistStore[];
  /** The run's surface (bandwidth, kernel, cell size, projection); absent in versions saved without it. */
  surface?: { bandwidthM: number; kernel: string; cellSizeM: number; projection: string };
};

export type ShortlistSummary = {
  id: string;
  workspaceId: string;
  workspaceName: string;
  name: string;
  latestVersion: number;
  itemCount: number;
  sharedAt: string | null;
  createdAt: string;
  updatedAt: string;
  createdBy: ShortlistPerson;
};

export type ShortlistVersionEntry = { version: number; createdAt: string; createdBy: ShortlistPerson; versionNote: string; itemCount: number };

export type ShortlistRecipient = { userId: string; name: string; email: string; sharedAt: string };

export type Shortlist = ShortlistSummary & {
  /** The version asked for (latest by default). */
  version: ShortlistVersion;
  versions: ShortlistVersionEntry[];
  sharedWith: ShortlistRecipient[];
  /** The real-estate caution shown beside every shortlist. */
  caution: string;
};

/** One chosen site in a create / new-version body, in the planner's order. */
export type ShortlistItemInput = { siteId: string; note?: string };

export type ShortlistCreateBody = { name: string; scoringRunId: string; items: ShortlistItemInput[]; versionNote?: string };

export type ShortlistVersionBody = { scoringRunId: string; items: ShortlistItemInput[]; versionNote?: string };

export type ShortlistShareBody = { message?: string; userIds?: string[] };

import type { CandidateScoreJson, ScoringRunJson, ScoringRunSummaryJson } from '../../scoring/types';
import type { Shortlist, ShortlistItem, ShortlistSummary, ShortlistVersion } from '../types';

const planner = { id: 'usr_planner', name: 'Orrin Castellow' };

/**
 * A shortlisted candidate (invented Quillport site) with its score and rank range.
 * @param overrides fields to set
 * @returns the item
 * @example createShortlistItem({ order: 2, name: 'Ropewalk Yard' })
 */
export function createShortlistItem(overrides: Partial<ShortlistItem> = {}): ShortlistItem {
  return {
    order: 1,
    siteId: 'site_quay',
    name: 'Quay Street corner',
    lon: -38.512,
    lat: 44.503,
    attractiveness: 180,
    attractivenessLabel: 'sales floor m²',
    note: 'Corner unit with morning foot traffic from the ferry.',
    score: {
      rank: 1,
      value: 1840.4,
      captured: 2310.7,
      cannibalization: 470.3,
      cannibalizedFrom: [{ siteId: 'site_own_1', name: 'Larchloaf Harbour', demand: 470.3 }],
      netNew: 1840.4,
      shareOfTotal: 0.0731,
      rings: [
        { radiusM: 1000, demand: 3120.5 },
        { radiusM: 3000, demand: 11804 },
      ],
      explanation: 'Ranks 1 of 8 by net new demand: captures 2,310 customers, 470 of them from Larchloaf Harbour.',
    },
    stability: { minRank: 1, maxRank: 2, unstable: false },
    ...overrides,
  };
}

/**
 * A shortlist version with two sites, one own store and one competitor.
 * @param overrides fields to set
 * @returns the version
 * @example createShortlistVersion({ version: 2, versionNote: 'Dropped the mill site' })
 */
export function createShortlistVersion(overrides: Partial<ShortlistVersion> = {}): ShortlistVersion {
  return {
    version: 1,
    createdAt: '2026-12-02T09:15:00.000Z',
    createdBy: planner,
    versionNote: 'First cut for the board.',
    scoringRunId: 'run_1',
    scoringRunName: 'Huff α 1 β 2 on harbour spend',
    surfaceId: 'srf_1',
    surfaceName: 'Harbour customers 2026',
    settings: {
      alpha: 1,
      beta: 2,
      radii: [1, 3],
      radiusUnit: 'km',
      measure: 'netNew',
      minDistanceM: null,
      isDefault: true,
      updatedAt: null,
      updatedBy: null,
      radiiM: [1000, 3000],
    },
    weightLabel: 'customers',
    totalDemand: 31_600,
    candidateCount: 8,
    items: [
      createShortlistItem(),
      createShortlistItem({
        order: 2,
        siteId: 'site_ropewalk',
        name: 'Ropewalk Yard',
        lon: -38.47,
        lat: 44.521,
        note: '',
        score: {
          rank: 3,
          value: 1204,
          captured: 1590,
          cannibalization: 386,
          cannibalizedFrom: [{ siteId: 'site_own_2', name: 'Larchloaf Millgate', demand: 386 }],
          netNew: 1204,
          shareOfTotal: 0.0503,
          rings: [
            { radiusM: 1000, demand: 2050 },
            { radiusM: 3000, demand: 9020 },
          ],
          explanation: 'Ranks 3 of 8: a busy catchment, but a quarter of it is Larchloaf Millgate’s today.',
        },
        stability: { minRank: 2, maxRank: 6, unstable: true },
      }),
    ],
    ownStores: [{ siteId: 'site_own_1', name: 'Larchloaf Harbour', lon: -38.52, lat: 44.49 }],
    competitors: [{ siteId: 'site_comp_1', name: 'Crumbhall Bakery', lon: -38.49, lat: 44.51 }],
    ...overrides,
  };
}

/**
 * A shortlist summary as the lists return it.
 * @param overrides fields to set
 * @returns the summary
 * @example createShortlistSummary({ sharedAt: null })
 */
export function createShortlistSummary(overrides: Partial<ShortlistSummary> = {}): ShortlistSummary {
  return {
    id: 'shl_1',
    workspaceId: 'wsp_1',
    workspaceName: 'North corridor 2027',
    name: 'Harbour candidates for the board',
    latestVersion: 1,
    itemCount: 2,
    sharedAt: null,
    createdAt: '2026-12-02T09:15:00.000Z',
    updatedAt: '2026-12-02T09:15:00.000Z',
    createdBy: planner,
    ...overrides,
  };
}

/**
 * A full shortlist with its (latest) version.
 * @param overrides fields to set
 * @returns the shortlist
 * @example createShortlist({ sharedWith: [] })
 */
export function createShortlist(overrides: Partial<Shortlist> = {}): Shortlist {
  return {
    ...createShortlistSummary(),
    version: createShortlistVersion(),
    versions: [{ version: 1, createdAt: '2026-12-02T09:15:00.000Z', createdBy: planner, versionNote: 'First cut for the board.', itemCount: 2 }],
    sharedWith: [],
    caution:
      'The demand surface is an estimate from a sample of customers. Check leases, zoning and local rules with licensed professionals before deciding.',
    ...overrides,
  };
}

/**
 * A ranked candidate of a scoring run.
 * @param overrides fields to set
 * @returns the candidate
 * @example createRunCandidate({ siteId: 's2', rank: 2 })
 */
export function createRunCandidate(overrides: Partial<CandidateScoreJson> = {}): CandidateScoreJson {
  return {
    siteId: 'site_quay',
    name: 'Quay Street corner',
    rank: 1,
    value: 1840.4,
    captured: 2310.7,
    cannibalization: 470.3,
    cannibalizedFrom: [{ siteId: 'site_own_1', name: 'Larchloaf Harbour', demand: 470.3 }],
    netNew: 1840.4,
    shareOfTotal: 0.0731,
    rings: [
      { radiusM: 1000, demand: 3120.5 },
      { radiusM: 3000, demand: 11804 },
    ],
    explanation: 'Ranks 1 of 3 by net new demand.',
    ...overrides,
  };
}

/**
 * A scoring run summary (succeeded by default).
 * @param overrides fields to set
 * @returns the run summary
 * @example createRunSummary({ status: 'running' })
 */
export function createRunSummary(overrides: Partial<ScoringRunSummaryJson> = {}): ScoringRunSummaryJson {
  return {
    id: 'run_1',
    workspaceId: 'wsp_1',
    name: 'Huff α 1 β 2 on harbour spend',
    status: 'succeeded',
    progress: 1,
    error: null,
    surfaceId: 'srf_1',
    surfaceName: 'Harbour customers 2026',
    settings: { ...createShortlistVersion().settings, measure: 'netNew' },
    weightLabel: 'customers',
    candidateCount: 3,
    createdAt: '2026-12-02T08:50:00.000Z',
    finishedAt: '2026-12-02T08:50:02.000Z',
    createdBy: planner,
    ...overrides,
  };
}

/**
 * A finished scoring run with three ranked candidates.
 * @param overrides fields to set
 * @returns the run
 * @example createRun({ id: 'run_2' })
 */
export function createRun(overrides: Partial<ScoringRunJson> = {}): ScoringRunJson {
  return {
    ...createRunSummary(),
    sites: [],
    results: {
      totalDemand: 31_600,
      ownToday: [{ siteId: 'site_own_1', name: 'Larchloaf Harbour', demand: 9100 }],
      candidates: [
        createRunCandidate(),
        createRunCandidate({ siteId: 'site_mill', name: 'Old Mill Lane', rank: 2, value: 1502, netNew: 1502, captured: 1700, cannibalization: 198, shareOfTotal: 0.0538 }),
        createRunCandidate({ siteId: 'site_ropewalk', name: 'Ropewalk Yard', rank: 3, value: 1204, netNew: 1204, captured: 1590, cannibalization: 386, shareOfTotal: 0.0503 }),
      ],
    },
    stability: null,
    sets: [],
    warnings: [],
    timings: null,
    surface: { bandwidthM: 1200, kernel: 'quartic', cellSizeM: 75, projection: 'UTM zone 25N (EPSG:32625)' },
    ...overrides,
  };
}

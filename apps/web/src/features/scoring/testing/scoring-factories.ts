import type { CandidateScoreJson, ScoringRunJson, ScoringSettingsJson, SiteSetJson, StabilityJson } from '../types';

/**
 * The default scoring settings (α = 1, β = 2, rings 1, 3, 5 km, net new demand).
 * @param overrides fields to set
 * @returns the settings
 * @example createScoringSettings({ beta: 2.5 })
 */
export function createScoringSettings(overrides: Partial<ScoringSettingsJson> = {}): ScoringSettingsJson {
  return {
    alpha: 1,
    beta: 2,
    radii: [1, 3, 5],
    radiusUnit: 'km',
    measure: 'netNew',
    minDistanceM: null,
    isDefault: true,
    updatedAt: null,
    updatedBy: null,
    ...overrides,
  };
}

/**
 * One candidate's score (invented Larchloaf candidate in Quillport).
 * @param overrides fields to set
 * @returns the score
 * @example createCandidateScore({ siteId: 'ste_c2', rank: 2 })
 */
export function createCandidateScore(overrides: Partial<CandidateScoreJson> = {}): CandidateScoreJson {
  return {
    siteId: 'ste_c1',
    name: 'Harbour Steps',
    rank: 1,
    value: 1840,
    captured: 2600,
    cannibalization: 760,
    cannibalizedFrom: [
      { siteId: 'ste_o1', name: 'Larchloaf Old Quay', demand: 520 },
      { siteId: 'ste_o2', name: 'Larchloaf Ropewalk', demand: 240 },
    ],
    netNew: 1840,
    shareOfTotal: 0.052,
    rings: [
      { radiusM: 1000, demand: 3100 },
      { radiusM: 3000, demand: 11_200 },
      { radiusM: 5000, demand: 19_800 },
    ],
    explanation: 'Harbour Steps ranks 1st: it would capture 2,600 customers, 760 of them from our own stores, so it adds 1,840 new.',
    ...overrides,
  };
}

/** Three ranked candidates, best first. */
export const threeCandidates: CandidateScoreJson[] = [
  createCandidateScore(),
  createCandidateScore({
    siteId: 'ste_c2',
    name: 'Tidemill Yard',
    rank: 2,
    value: 1210,
    captured: 1500,
    cannibalization: 290,
    cannibalizedFrom: [{ siteId: 'ste_o1', name: 'Larchloaf Old Quay', demand: 290 }],
    netNew: 1210,
    shareOfTotal: 0.03,
    explanation: 'Tidemill Yard ranks 2nd: it would capture 1,500 customers, 290 of them from our own stores.',
  }),
  createCandidateScore({
    siteId: 'ste_c3',
    name: 'Gull Terrace',
    rank: 3,
    value: 400,
    captured: 450,
    cannibalization: 50,
    cannibalizedFrom: [{ siteId: 'ste_o2', name: 'Larchloaf Ropewalk', demand: 50 }],
    netNew: 400,
    shareOfTotal: 0.009,
    explanation: 'Gull Terrace ranks 3rd: little demand nearby.',
  }),
];

/**
 * A scoring run (queued by default; pass `status: 'succeeded'` and `results` for a finished one).
 * @param overrides fields to set
 * @returns the run
 * @example createScoringRun({ status: 'running', progress: 0.4 })
 */
export function createScoringRun(overrides: Partial<ScoringRunJson> = {}): ScoringRunJson {
  return {
    id: 'scr_1',
    workspaceId: 'wsp_1',
    name: 'Quillport candidates · quartic 1200 m',
    status: 'queued',
    progress: 0,
    error: null,
    surfaceId: 'srf_1',
    surfaceName: 'larchloaf-loyalty.csv · quartic 1200 m',
    settings: { ...createScoringSettings(), radiiM: [1000, 3000, 5000] },
    weightLabel: 'customers',
    candidateCount: 3,
    createdAt: '2026-12-02T09:00:00.000Z',
    finishedAt: null,
    createdBy: { id: 'usr_planner', name: 'Oswin Marrow' },
    sites: [],
    results: null,
    stability: null,
    sets: [],
    warnings: [],
    timings: null,
    surface: { bandwidthM: 1200, kernel: 'quartic', cellSizeM: 75, projection: 'UTM zone 25N (EPSG:32625)' },
    ...overrides,
  };
}

/**
 * A finished run with the three candidates ranked.
 * @param overrides fields to set
 * @returns the run
 * @example createFinishedScoringRun({ stability: createStability() })
 */
export function createFinishedScoringRun(overrides: Partial<ScoringRunJson> = {}): ScoringRunJson {
  return createScoringRun({
    status: 'succeeded',
    progress: 1,
    finishedAt: '2026-12-02T09:00:01.000Z',
    results: {
      totalDemand: 50_000,
      ownToday: [
        { siteId: 'ste_o1', name: 'Larchloaf Old Quay', demand: 9000 },
        { siteId: 'ste_o2', name: 'Larchloaf Ropewalk', demand: 6000 },
      ],
      candidates: threeCandidates.map((c) => ({ ...c })),
    },
    ...overrides,
  });
}

/**
 * A finished rank-stability check: Gull Terrace moves from 3rd to 1st at half the bandwidth.
 * @param overrides fields to set
 * @returns the check
 * @example createStability({ status: 'running' })
 */
export function createStability(overrides: Partial<StabilityJson> = {}): StabilityJson {
  return {
    status: 'succeeded',
    error: null,
    factors: [0.5, 0.75, 1, 1.5, 2],
    threshold: 1,
    variants: [
      { factor: 0.5, bandwidthM: 600, tau: -0.333 },
      { factor: 0.75, bandwidthM: 900, tau: 1 },
      { factor: 1, bandwidthM: 1200, tau: 1 },
      { factor: 1.5, bandwidthM: 1800, tau: 1 },
      { factor: 2, bandwidthM: 2400, tau: 0.333 },
    ],
    sites: [
      { siteId: 'ste_c1', name: 'Harbour Steps', baseRank: 1, minRank: 1, maxRank: 2, maxShift: 1, unstable: false, ranks: [2, 1, 1, 1, 1] },
      { siteId: 'ste_c2', name: 'Tidemill Yard', baseRank: 2, minRank: 2, maxRank: 3, maxShift: 1, unstable: false, ranks: [3, 2, 2, 2, 3] },
      { siteId: 'ste_c3', name: 'Gull Terrace', baseRank: 3, minRank: 1, maxRank: 3, maxShift: 2, unstable: true, ranks: [1, 3, 3, 3, 2] },
    ],
    finishedAt: '2026-12-02T09:01:00.000Z',
    ...overrides,
  };
}

/**
 * Harbour Steps and Tidemill Yard opened together.
 * @param overrides fields to set
 * @returns the set
 * @example createSiteSet({ name: 'North pair' })
 */
export function createSiteSet(overrides: Partial<SiteSetJson> = {}): SiteSetJson {
  return {
    id: 'set_1',
    name: 'Harbour Steps + Tidemill Yard',
    siteIds: ['ste_c1', 'ste_c2'],
    members: [
      { siteId: 'ste_c1', name: 'Harbour Steps', captured: 2300, shareOfTotal: 0.046 },
      { siteId: 'ste_c2', name: 'Tidemill Yard', captured: 1300, shareOfTotal: 0.026 },
    ],
    captured: 3600,
    cannibalization: 980,
    cannibalizedFrom: [
      { siteId: 'ste_o1', name: 'Larchloaf Old Quay', demand: 740 },
      { siteId: 'ste_o2', name: 'Larchloaf Ropewalk', demand: 240 },
    ],
    netNew: 2620,
    shareOfTotal: 0.072,
    createdAt: '2026-12-02T09:02:00.000Z',
    createdBy: { id: 'usr_planner', name: 'Oswin Marrow' },
    ...overrides,
  };
}

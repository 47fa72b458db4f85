import type { CandidateScoreJson, ScoringRunJson } from '../scoring/scoring.types.js';

function candidate(
  siteId: string,
  name: string,
  rank: number,
  captured: number,
  from: Array<[string, string, number]>,
  rings: number[],
): CandidateScoreJson {
  const cannibalization = from.reduce((s, [, , d]) => s + d, 0);
  const netNew = captured - cannibalization;
  return {
    siteId,
    name,
    rank,
    value: netNew,
    captured,
    cannibalization,
    cannibalizedFrom: from.map(([id, n, demand]) => ({ siteId: id, name: n, demand })),
    netNew,
    shareOfTotal: captured / 40_000,
    rings: rings.map((demand, k) => ({ radiusM: [1000, 3000][k], demand })),
    explanation: `Captures ${captured} customers; ${cannibalization} from own stores. Ranks ${rank} of 3 by net new demand.`,
  };
}

/**
 * A hand-built succeeded scoring run (invented Quillport sites; the numbers are consistent:
 * net new = captured − cannibalization, share = captured / total) for the report and shortlist tests.
 * Names include CSV specials (quote, comma) and a formula-like name.
 * @returns a fresh copy of the run
 * @example
 * const run = reportRunFixture();
 */
export function reportRunFixture(): ScoringRunJson {
  return {
    id: 'run-1',
    workspaceId: 'ws-1',
    name: 'Harbour run',
    status: 'succeeded',
    progress: 1,
    error: null,
    surfaceId: 'surf-1',
    surfaceName: 'Loyalty spend 2026',
    settings: {
      alpha: 1,
      beta: 2,
      radii: [1, 3],
      radiusUnit: 'km',
      measure: 'netNew',
      minDistanceM: null,
      isDefault: false,
      updatedAt: '2026-12-02T02:00:00.000Z',
      updatedBy: { id: 'u-p', name: 'Pia Planner' },
      radiiM: [1000, 3000],
    },
    weightLabel: 'customers',
    candidateCount: 3,
    createdAt: '2026-12-02T02:10:00.000Z',
    finishedAt: '2026-12-02T02:10:01.000Z',
    createdBy: { id: 'u-p', name: 'Pia Planner' },
    sites: [
      {
        siteId: 'c-quay',
        name: 'Quay "corner", east',
        kind: 'candidate',
        lon: -38.5123456789,
        lat: 44.5212345678,
        attractiveness: 120,
        attractivenessLabel: 'sales floor m²',
        notes: 'Corner unit',
      },
      {
        siteId: 'c-mill',
        name: 'Mill Lane',
        kind: 'candidate',
        lon: -38.48,
        lat: 44.53,
        attractiveness: 90,
        attractivenessLabel: 'sales floor m²',
        notes: '',
      },
      {
        siteId: 'c-eq',
        name: '=HYPERLINK("x")',
        kind: 'candidate',
        lon: -38.47,
        lat: 44.5,
        attractiveness: 60,
        attractivenessLabel: 'sales floor m²',
        notes: '',
      },
      {
        siteId: 'o-harbour',
        name: 'Harbour Row',
        kind: 'own',
        lon: -38.5,
        lat: 44.52,
        attractiveness: 150,
        attractivenessLabel: 'sales floor m²',
        notes: '',
      },
      {
        siteId: 'o-ferry',
        name: 'Ferry Steps',
        kind: 'own',
        lon: -38.49,
        lat: 44.51,
        attractiveness: 110,
        attractivenessLabel: 'sales floor m²',
        notes: '',
      },
      {
        siteId: 'k-tide',
        name: 'Tidewater Buns',
        kind: 'competitor',
        lon: -38.52,
        lat: 44.54,
        attractiveness: 200,
        attractivenessLabel: 'sales floor m²',
        notes: '',
      },
    ],
    results: {
      totalDemand: 40_000,
      ownToday: [
        { siteId: 'o-harbour', name: 'Harbour Row', demand: 15_000 },
        { siteId: 'o-ferry', name: 'Ferry Steps', demand: 9_000 },
      ],
      candidates: [
        candidate(
          'c-quay',
          'Quay "corner", east',
          1,
          12_400.25,
          [
            ['o-harbour', 'Harbour Row', 2_000],
            ['o-ferry', 'Ferry Steps', 1_100],
          ],
          [3_200.5, 14_000],
        ),
        candidate(
          'c-mill',
          'Mill Lane',
          2,
          8_000,
          [
            ['o-harbour', 'Harbour Row', 500],
            ['o-ferry', 'Ferry Steps', 2_500],
          ],
          [2_100, 9_800],
        ),
        candidate(
          'c-eq',
          '=HYPERLINK("x")',
          3,
          3_000,
          [
            ['o-harbour', 'Harbour Row', 200],
            ['o-ferry', 'Ferry Steps', 300],
          ],
          [900, 4_000],
        ),
      ],
    },
    stability: {
      status: 'succeeded',
      error: null,
      factors: [0.5, 0.75, 1, 1.5, 2],
      threshold: 2,
      variants: [],
      sites: [
        {
          siteId: 'c-quay',
          name: 'Quay "corner", east',
          baseRank: 1,
          minRank: 1,
          maxRank: 2,
          maxShift: 1,
          unstable: false,
          ranks: [1, 1, 1, 2, 2],
        },
        {
          siteId: 'c-mill',
          name: 'Mill Lane',
          baseRank: 2,
          minRank: 1,
          maxRank: 2,
          maxShift: 1,
          unstable: false,
          ranks: [2, 2, 2, 1, 1],
        },
        {
          siteId: 'c-eq',
          name: '=HYPERLINK("x")',
          baseRank: 3,
          minRank: 3,
          maxRank: 3,
          maxShift: 0,
          unstable: false,
          ranks: [3, 3, 3, 3, 3],
        },
      ],
      finishedAt: '2026-12-02T02:11:00.000Z',
    },
    sets: [],
    warnings: [],
    timings: { score: 0.2 },
    surface: { bandwidthM: 1200, kernel: 'quartic', cellSizeM: 100, projection: 'EPSG:32624' },
  };
}

import type { Surface, SurfaceEstimate, SurfaceSource } from '../types';

/**
 * A demand-surface run as the API returns it (invented Larchloaf study), queued by default.
 * @param overrides fields to set
 * @returns the run
 * @example createSurface({ status: 'running', progress: 0.3 })
 */
export function createSurface(overrides: Partial<Surface> = {}): Surface {
  return {
    id: 'srf_1',
    name: 'larchloaf-loyalty.csv · quartic 1200 m',
    status: 'queued',
    progress: 0,
    customerFileId: 'cf_1',
    params: {
      kernel: 'quartic',
      bandwidth: { mode: 'rule', rule: 'normal-reference' },
      studyArea: { type: 'extent' },
      edgeCorrection: false,
      adaptive: false,
      unit: 'km2',
      method: 'auto',
    },
    resolved: null,
    attempts: 1,
    pointCount: 488,
    costCredits: 1,
    queuedAt: '2026-12-01T10:00:00.000Z',
    startedAt: null,
    finishedAt: null,
    timings: null,
    error: null,
    stats: null,
    thresholds: null,
    createdBy: { id: 'usr_analyst', name: 'Tamsin Reedholm' },
    createdAt: '2026-12-01T10:00:00.000Z',
    ...overrides,
  };
}

/**
 * A live estimate for a normal-reference quartic run.
 * @param overrides fields to set
 * @returns the estimate
 * @example createSurfaceEstimate({ warnings: ['…'] })
 */
export function createSurfaceEstimate(overrides: Partial<SurfaceEstimate> = {}): SurfaceEstimate {
  return {
    bandwidth: {
      value: 1200,
      rule: 'normal-reference',
      explanation: '1,200 m radius from the normal-reference rule (spread 410 m, 488 customers)',
      gaussianSd: 432,
      radius: 1200,
    },
    cellSize: { value: 75, explanation: '75 m: one sixteenth of the bandwidth, rounded' },
    grid: { width: 420, height: 380, cells: 159_600 },
    cost: { credits: 1, formula: 'credits = max(1, ⌈customers × grid cells ÷ 3,000,000,000⌉)' },
    method: 'exact',
    estimatedSeconds: 0.4,
    warnings: [],
    projection: { epsg: 32625, label: 'UTM zone 25N (EPSG:32625)' },
    ...overrides,
  };
}

/**
 * An imported customer file the form can build from.
 * @param overrides fields to set
 * @returns the source
 * @example createSurfaceSource({ acceptedCount: 1000 })
 */
export function createSurfaceSource(overrides: Partial<SurfaceSource> = {}): SurfaceSource {
  return { id: 'cf_1', name: 'larchloaf-loyalty.csv', acceptedCount: 488, weightLabel: 'annual spend (€)', ...overrides };
}

import { kdeBinnedMultiBandwidth, projectionConverter, rankStabilityFromSurfaces, type KernelName, type LocalProjection } from '@demandscape/core';
import { rankMeasureOf, runSitesProjected, scoringSurfaceFromRaster, type ScoringComputeInput } from './scoring-compute.js';
import type { StabilityJson } from './scoring.types.js';

/** Bandwidth multipliers of a stability check; 1 is the run's own surface. */
export const STABILITY_FACTORS: readonly number[] = [0.5, 0.75, 1, 1.5, 2];

/** What a stability check needs besides the run's scoring input. */
export interface StabilityComputeInput extends ScoringComputeInput {
  /** The customer file's points, lon/lat degrees and weights (they stay on the server). */
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
  kernel: KernelName;
  /** The surface's bandwidth, metres. */
  bandwidthM: number;
}

/**
 * Rank stability of a run: the customer points are projected with the surface's proj4 and binned
 * once onto the SAME grid; binned surfaces at 0.5, 0.75, 1.5 and 2 × the bandwidth come from one
 * FFT of that lattice (core `kdeBinnedMultiBandwidth`), cells outside the study area (NaN in the
 * stored raster) are masked; the run's own surface is factor 1. Each is rescored (core
 * `rankStabilityFromSurfaces`) with the run's α, β, rings and measure. Pure: runs in a worker thread.
 * @param input the run's input plus the points, kernel and bandwidth
 * @returns the stability block (status succeeded)
 * @example
 * const stability = scoringStabilityCompute(input);
 */
export function scoringStabilityCompute(input: StabilityComputeInput): StabilityJson {
  const { grid, settings } = input;
  const converter = projectionConverter({ ...input.projection, centerLon: 0, centerLat: 0 } as LocalProjection);
  const { x, y } = converter.forward(input.lon, input.lat);
  const mask = new Uint8Array(input.raster.length);
  let masked = false;
  for (let c = 0; c < mask.length; c++) {
    mask[c] = Number.isNaN(input.raster[c]) ? 0 : 1;
    if (mask[c] === 0) masked = true;
  }
  const others = STABILITY_FACTORS.filter((f) => f !== 1);
  const built = kdeBinnedMultiBandwidth({ x, y, w: input.w }, grid, input.kernel, others.map((f) => f * input.bandwidthM), { mask: masked ? mask : undefined });
  const variants = STABILITY_FACTORS.map((factor) => {
    if (factor === 1) return { factor, surface: scoringSurfaceFromRaster(input.raster, grid) };
    const values = built[others.indexOf(factor)].values;
    for (let c = 0; c < values.length; c++) values[c] *= 1e6; // per m² → per km²
    return { factor, surface: { spec: { ...grid }, values } };
  });
  const sites = runSitesProjected(input.sites, input.projection);
  const report = rankStabilityFromSurfaces(variants, sites, {
    alpha: settings.alpha,
    beta: settings.beta,
    radii: settings.radiiM,
    minDistanceM: settings.minDistanceM,
    measure: rankMeasureOf(settings.measure, settings.radiiM),
  });
  const nameOf = new Map(input.sites.map((s) => [s.siteId, s.name]));
  const rankIn = report.variants.map((v) => new Map(v.ranking.map((r) => [r.id, r.rank])));
  return {
    status: 'succeeded',
    error: null,
    factors: [...STABILITY_FACTORS],
    threshold: report.threshold,
    variants: report.variants.map((v) => ({ factor: v.factor, bandwidthM: v.factor * input.bandwidthM, tau: v.tau })),
    sites: report.sites.map((s) => ({
      siteId: s.id,
      name: nameOf.get(s.id) ?? s.id,
      baseRank: s.baseRank,
      minRank: s.minRank,
      maxRank: s.maxRank,
      maxShift: s.maxShift,
      unstable: s.unstable,
      ranks: rankIn.map((m) => m.get(s.id)!),
    })),
    finishedAt: new Date().toISOString(),
  };
}

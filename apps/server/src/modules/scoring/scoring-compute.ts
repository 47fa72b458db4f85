import {
  projectionConverter,
  siteRanking,
  siteScores,
  siteScoresFromParts,
  siteScoresPart,
  type GridSpec,
  type LocalProjection,
  type RankMeasure,
  type ScoringSurface,
  type Site,
  type SiteScores,
  type SiteScoresPart,
} from '@demandscape/core';
import type { SurfaceResolved } from '../surface/surface.entity.js';
import { candidateExplanation } from './scoring-explanation.js';
import type { CandidateScoreJson, RunSiteJson, ScoringMeasure, ScoringResultsJson, ScoringRunSummaryJson } from './scoring.types.js';

/** What a scoring computation returns. */
export interface ScoringComputeOutput {
  results: ScoringResultsJson;
  warnings: string[];
  /** Seconds per stage. */
  timings: Record<string, number>;
}

/** Settings as a run stores them (radii also in metres). */
export type RunSettings = ScoringRunSummaryJson['settings'];

/** What a scoring computation needs (everything crosses into a worker thread). */
export interface ScoringComputeInput {
  /** The surface raster: weight per km², row-major, j = 0 south; NaN outside the study area. */
  raster: Float32Array;
  grid: GridSpec;
  projection: SurfaceResolved['projection'];
  sites: RunSiteJson[];
  settings: RunSettings;
  weightLabel: string;
}

/**
 * The stored raster as a scoring surface: NaN (outside the study area) counts as no demand.
 * @param raster Float32 per km²
 * @param grid its grid
 * @returns Float64 values on the same grid
 * @example
 * const surface = scoringSurfaceFromRaster(raster, resolved.grid);
 */
export function scoringSurfaceFromRaster(raster: Float32Array, grid: GridSpec): ScoringSurface {
  const values = new Float64Array(raster.length);
  for (let c = 0; c < raster.length; c++) values[c] = Number.isNaN(raster[c]) ? 0 : raster[c];
  return { spec: { ...grid }, values };
}

/**
 * Projects the run's sites into the surface's projection (the same proj4 definition the surface used).
 * @param sites sites in lon/lat
 * @param projection the surface's resolved projection
 * @returns core sites in metres, ids = site ids
 * @example
 * const planar = runSitesProjected(run.sites, surface.resolved.projection);
 */
export function runSitesProjected(sites: readonly RunSiteJson[], projection: SurfaceResolved['projection']): Site[] {
  const converter = projectionConverter({ ...projection, centerLon: 0, centerLat: 0 } as LocalProjection);
  return sites.map((s) => {
    const [x, y] = converter.forwardPoint(s.lon, s.lat);
    return { id: s.siteId, kind: s.kind, x, y, attractiveness: s.attractiveness };
  });
}

/**
 * The core ranking measure of a run's measure.
 * @param measure run measure
 * @param radiiM ring radii in metres
 * @returns the core measure
 * @example
 * rankMeasureOf('ring:1', [1000, 3000]); // { ringRadius: 3000 }
 */
export function rankMeasureOf(measure: ScoringMeasure, radiiM: readonly number[]): RankMeasure {
  if (!measure.startsWith('ring:')) return measure as RankMeasure;
  return { ringRadius: radiiM[Number(measure.slice('ring:'.length))] };
}

function insideGrid(grid: GridSpec, x: number, y: number): boolean {
  return x >= grid.originX && y >= grid.originY && x <= grid.originX + grid.width * grid.cellSize && y <= grid.originY + grid.height * grid.cellSize;
}

/**
 * Warnings about the network and the sites' places on the grid.
 * @param sites the run's sites
 * @param planar the same sites projected
 * @param grid the surface grid
 * @returns plain-words warnings
 * @example
 * scoringWarnings(run.sites, planar, grid); // ["No own stores: cannibalization is 0 …"]
 */
export function scoringWarnings(sites: readonly RunSiteJson[], planar: readonly Site[], grid: GridSpec): string[] {
  const warnings: string[] = [];
  const outside = sites.filter((s, k) => !insideGrid(grid, planar[k].x, planar[k].y));
  const outsideCandidates = outside.filter((s) => s.kind === 'candidate').map((s) => s.name);
  if (outsideCandidates.length > 0) {
    warnings.push(
      `${outsideCandidates.length === 1 ? 'Candidate' : `${outsideCandidates.length} candidates`} outside the surface's grid (${listText(outsideCandidates)}): demand beyond the grid is unknown, so ring demand and captured demand count only the demand on the grid.`,
    );
  }
  const outsideStores = outside.filter((s) => s.kind !== 'candidate').map((s) => s.name);
  if (outsideStores.length > 0) {
    warnings.push(`${outsideStores.length === 1 ? 'Store' : `${outsideStores.length} stores`} outside the surface's grid (${listText(outsideStores)}): they still compete for demand on the grid.`);
  }
  if (!sites.some((s) => s.kind === 'own')) warnings.push('No own stores: cannibalization is 0 and net new demand equals captured demand. Add own stores to see what a new site takes from them.');
  if (!sites.some((s) => s.kind === 'competitor')) warnings.push('No competitor stores: each candidate shares demand only with own stores, so captured demand is an upper bound. Add competitors for a fairer picture.');
  return warnings;
}

function listText(names: string[]): string {
  return names.length <= 5 ? names.join(', ') : `${names.slice(0, 5).join(', ')} and ${names.length - 5} more`;
}

/**
 * Scores every candidate of a run alone against today's network (core `siteScores`), ranks them
 * by the run's measure (core `siteRanking`) and writes each one's explanation. Pure: runs in a
 * worker thread.
 * @param input surface raster, grid, projection, sites snapshot, settings, weight label
 * @param onProgress receives 0–1
 * @returns results sorted by rank, warnings and timings (s)
 * @example
 * const { results } = scoringCompute(input);
 */
export function scoringCompute(input: ScoringComputeInput, onProgress?: (fraction: number) => void): ScoringComputeOutput {
  let t = performance.now();
  const surface = scoringSurfaceFromRaster(input.raster, input.grid);
  const planar = runSitesProjected(input.sites, input.projection);
  const warnings = scoringWarnings(input.sites, planar, input.grid);
  const prepare = seconds(t);
  t = performance.now();
  const { settings } = input;
  const scores = siteScores(surface, planar, { alpha: settings.alpha, beta: settings.beta, radii: settings.radiiM, minDistanceM: settings.minDistanceM, onProgress });
  const huff = seconds(t);
  t = performance.now();
  const results = scoringResultsFrom(input, scores);
  return { results, warnings, timings: { prepare, huff, rank: seconds(t) } };
}

/**
 * One worker's share of a split run: the Huff and ring sums over grid rows `rows` (core
 * `siteScoresPart`); parts of disjoint rows covering the grid are joined by {@link scoringJoin}.
 * @param input the run's input
 * @param rows [first row, row after the last)
 * @param onProgress receives 0–1
 * @returns the part (plain typed arrays; transfer their buffers)
 * @example
 * const top = scoringPartCompute(input, [0, 200]);
 */
export function scoringPartCompute(input: ScoringComputeInput, rows: [number, number], onProgress?: (fraction: number) => void): SiteScoresPart {
  const surface = scoringSurfaceFromRaster(input.raster, input.grid);
  const planar = runSitesProjected(input.sites, input.projection);
  const { settings } = input;
  return siteScoresPart(surface, planar, { alpha: settings.alpha, beta: settings.beta, radii: settings.radiiM, minDistanceM: settings.minDistanceM, rows, onProgress });
}

/**
 * How much Huff work a run is: demand cells × candidates × (own stores + 1) — one pass per
 * candidate plus one per own store for the cannibalization split.
 * @param input the run's input
 * @returns the number of cell terms
 * @example
 * if (scoringWork(input) > 1e9) … // split over two threads
 */
export function scoringWork(input: ScoringComputeInput): number {
  let cells = 0;
  for (let c = 0; c < input.raster.length; c++) if (input.raster[c] > 0) cells++;
  const candidates = input.sites.filter((s) => s.kind === 'candidate').length;
  return cells * candidates * (input.sites.filter((s) => s.kind === 'own').length + 1);
}

/**
 * Joins the parts of a split run (core `siteScoresFromParts`) and ranks and explains as
 * {@link scoringCompute} does.
 * @param input the run's input (its raster is only read for the grid and warnings)
 * @param parts parts covering every grid row once
 * @param huffSeconds wall time of the parts
 * @returns results, warnings and timings (s)
 * @example
 * const out = scoringJoin(input, [top, bottom], 1.2);
 */
export function scoringJoin(input: ScoringComputeInput, parts: readonly SiteScoresPart[], huffSeconds: number): ScoringComputeOutput {
  const t = performance.now();
  const planar = runSitesProjected(input.sites, input.projection);
  const warnings = scoringWarnings(input.sites, planar, input.grid);
  const scores = siteScoresFromParts({ spec: input.grid, values: new Float64Array(0) }, planar, parts, { radii: input.settings.radiiM });
  const results = scoringResultsFrom(input, scores);
  return { results, warnings, timings: { huff: huffSeconds, join: seconds(t) } };
}

function seconds(start: number): number {
  return Number(((performance.now() - start) / 1000).toFixed(3));
}

function scoringResultsFrom(input: ScoringComputeInput, scores: SiteScores): ScoringResultsJson {
  const { settings } = input;
  const ranking = siteRanking(scores.candidates, rankMeasureOf(settings.measure, settings.radiiM));
  const byId = new Map(input.sites.map((s) => [s.siteId, s]));
  const scoreById = new Map(scores.candidates.map((c) => [c.id, c]));
  const nameOf = (id: string): string => byId.get(id)?.name ?? id;
  const ownCount = input.sites.filter((s) => s.kind === 'own').length;
  const candidates: CandidateScoreJson[] = ranking.map((r) => {
    const c = scoreById.get(r.id)!;
    const cannibalizedFrom = c.cannibalizedFrom.map((l) => ({ siteId: l.id, name: nameOf(l.id), demand: l.demand }));
    const rings = c.rings.map((g) => ({ radiusM: g.radius, demand: g.demand }));
    return {
      siteId: c.id,
      name: nameOf(c.id),
      rank: r.rank,
      value: r.value,
      captured: c.captured,
      cannibalization: c.cannibalization,
      cannibalizedFrom,
      netNew: c.netNew,
      shareOfTotal: c.shareOfTotal,
      rings,
      explanation: candidateExplanation({
        captured: c.captured,
        shareOfTotal: c.shareOfTotal,
        cannibalization: c.cannibalization,
        cannibalizedFrom,
        netNew: c.netNew,
        rank: r.rank,
        candidateCount: ranking.length,
        measure: settings.measure,
        rings,
        ownStoreCount: ownCount,
        weightLabel: input.weightLabel,
        radiusUnit: settings.radiusUnit,
      }),
    };
  });
  return { totalDemand: scores.totalDemand, ownToday: scores.ownToday.map((o) => ({ siteId: o.id, name: nameOf(o.id), demand: o.demand })), candidates };
}

import type { KernelName } from '@demandscape/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { ConflictError } from '../common/errors.js';
import { customerPointsLoad } from '../customer-file/customer-points.js';
import { SurfaceRasterSchema, SurfaceSchema, type Surface } from '../surface/surface.entity.js';
import type { ScoringComputeInput } from './scoring-compute.js';
import type { ScoringRun } from './scoring-run.entity.js';
import type { StabilityComputeInput } from './scoring-stability.js';

/**
 * The run's surface, still there and succeeded, or a 409 that says what to do.
 * @param em entity manager
 * @param run the run
 * @returns the surface row
 * @throws ConflictError SURFACE_DELETED / SURFACE_NOT_READY
 * @example
 * const surface = await scoringRunSurface(em, run);
 */
export async function scoringRunSurface(em: EntityManager, run: ScoringRun): Promise<Surface> {
  const surface = run.surfaceId ? await em.findOne(SurfaceSchema, { id: run.surfaceId, workspace: run.workspace.id }) : null;
  if (!surface) {
    throw new ConflictError('SURFACE_DELETED', `The surface "${run.surfaceName}" of this run was deleted; its stored results stay, but new computations need a surface: start a new run on another surface.`);
  }
  if (surface.status !== 'succeeded' || !surface.resolved) {
    throw new ConflictError('SURFACE_NOT_READY', `The surface "${surface.name}" is ${surface.status}; scoring needs a surface that has succeeded.`, 'surfaceId');
  }
  return surface;
}

/**
 * Everything a worker needs to score a run: the surface raster (an aligned Float32 copy), its grid
 * and projection, and the run's site and settings snapshots.
 * @param em entity manager
 * @param run the run (sites loaded)
 * @returns the worker input (transfer `raster.buffer`)
 * @throws ConflictError when the surface is gone or not succeeded
 * @example
 * const input = await scoringInputLoad(em, run);
 */
export async function scoringInputLoad(em: EntityManager, run: ScoringRun): Promise<ScoringComputeInput> {
  const surface = await scoringRunSurface(em, run);
  const row = await em.findOne(SurfaceRasterSchema, { surface: surface.id, kind: 'intensity' }, { populate: ['data'] });
  if (!row) throw new ConflictError('SURFACE_NOT_READY', `The surface "${surface.name}" has no stored raster; compute the surface again.`, 'surfaceId');
  // Copy into an aligned buffer: the blob may start at any byte offset.
  const bytes = new Uint8Array(row.data.byteLength);
  bytes.set(row.data);
  em.getUnitOfWork().unsetIdentity(row);
  return {
    raster: new Float32Array(bytes.buffer),
    grid: { ...surface.resolved!.grid },
    projection: surface.resolved!.projection,
    sites: run.sites,
    settings: run.settings,
    weightLabel: run.weightLabel,
  };
}

/**
 * The customer file's points of the run's surface (for rank stability).
 * @param em entity manager
 * @param surface the run's surface
 * @returns lon, lat and weight arrays
 * @throws ConflictError CUSTOMER_FILE_DELETED when the file is gone
 * @example
 * const points = await scoringPointsLoad(em, surface);
 */
export async function scoringPointsLoad(em: EntityManager, surface: Surface): Promise<{ lon: Float64Array; lat: Float64Array; w: Float64Array }> {
  if (!surface.customerFileId) {
    throw new ConflictError(
      'CUSTOMER_FILE_DELETED',
      `The customer file behind the surface "${surface.name}" was deleted, so surfaces at other bandwidths cannot be rebuilt; rank stability needs a surface whose customer file still exists.`,
    );
  }
  const p = await customerPointsLoad(em, surface.customerFileId);
  return { lon: p.lon, lat: p.lat, w: p.w };
}

/**
 * The stability worker's input: the run's scoring input plus points, kernel and bandwidth.
 * @param em entity manager
 * @param run the run (sites loaded)
 * @returns the input (transfer raster and point buffers)
 * @example
 * const input = await scoringStabilityInputLoad(em, run);
 */
export async function scoringStabilityInputLoad(em: EntityManager, run: ScoringRun): Promise<StabilityComputeInput> {
  const base = await scoringInputLoad(em, run);
  const surface = await scoringRunSurface(em, run);
  const points = await scoringPointsLoad(em, surface);
  return { ...base, ...points, kernel: surface.params.kernel as KernelName, bandwidthM: surface.resolved!.bandwidth.value };
}

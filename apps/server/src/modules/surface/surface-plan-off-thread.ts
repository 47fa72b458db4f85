import type { CustomerPoints } from '../customer-file/customer-points.js';
import type { ComputeSurfaceInput, ComputeSurfaceMessage } from '../../jobs/compute-surface.js';
import { computeSurfaceFile } from '../../jobs/surface-worker-start.js';
import { workerAnswer } from '../../jobs/worker-answer.js';
import { SurfaceInputError } from './surface-errors.js';
import type { SurfacePlanSummary } from './surface-plan.js';
import type { SurfaceParams } from './surface.schemas.js';

/**
 * Plans a run (`surfacePlan`) in a worker thread, so projecting and choosing a bandwidth for up to
 * millions of points does not stall other requests.
 * @param points the customer file's points (their buffers are transferred: do not reuse them)
 * @param params surface parameters
 * @returns the plan summary (bandwidth, cell size, grid, method, cost, warnings, projection)
 * @throws SurfaceInputError 400 with the engine's code, field, message and details
 * @example
 * const plan = await surfacePlanOffThread(await customerPointsLoad(em, fileId), params);
 */
export function surfacePlanOffThread(points: CustomerPoints, params: SurfaceParams): Promise<SurfacePlanSummary> {
  const input: ComputeSurfaceInput = { mode: 'plan', lon: points.lon, lat: points.lat, w: points.w, params };
  const transfer = [points.lon.buffer, points.lat.buffer, points.w.buffer] as ArrayBuffer[];
  return workerAnswer<ComputeSurfaceMessage, SurfacePlanSummary>(
    computeSurfaceFile(),
    input,
    transfer,
    (m) => {
      if (m.type === 'plan') return { value: m.plan };
      if (m.type !== 'error') return undefined;
      const field = m.field === 'spec' || m.field === 'polygon' ? 'studyArea' : m.field;
      return { error: m.input ? new SurfaceInputError(m.code, m.message, field, m.details) : new Error(m.message) };
    },
    'planning',
  ).answer;
}

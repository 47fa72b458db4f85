import type { CustomerPoints } from '../customer-file/customer-points.js';
import type { ComputeSurfaceInput, ComputeSurfaceMessage } from '../../jobs/compute-surface.js';
import { computeSurfaceFile, workerStart } from '../../jobs/surface-worker-start.js';
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
  return new Promise((resolve, reject) => {
    const worker = workerStart(computeSurfaceFile());
    let settled = false;
    const done = (fn: () => void): void => {
      if (settled) return;
      settled = true;
      fn();
      void worker.terminate();
    };
    worker.on('message', (m: ComputeSurfaceMessage) => {
      if (m.type === 'plan') done(() => resolve(m.plan));
      else if (m.type === 'error') {
        const field = m.field === 'spec' || m.field === 'polygon' ? 'studyArea' : m.field;
        done(() => reject(m.input ? new SurfaceInputError(m.code, m.message, field, m.details) : new Error(m.message)));
      }
    });
    worker.on('error', (err) => done(() => reject(err)));
    worker.on('exit', (code) => done(() => reject(new Error(`the planning worker stopped (exit code ${code})`))));
    const input: ComputeSurfaceInput = { mode: 'plan', lon: points.lon, lat: points.lat, w: points.w, params };
    worker.postMessage(input, [points.lon.buffer, points.lat.buffer, points.w.buffer] as ArrayBuffer[]);
  });
}

import { parentPort } from 'node:worker_threads';
import { isCoreError } from '@demandscape/core';
import { surfaceCompute } from '../modules/surface/surface-compute.js';
import { surfacePlan, surfacePlanSummary, type SurfacePlanSummary } from '../modules/surface/surface-plan.js';
import type { SurfaceParams } from '../modules/surface/surface.schemas.js';

// Worker thread of one surface run (started by SurfaceRunner through Bree), or of one plan for the
// estimate/create routes (so projecting and choosing a bandwidth for a million points never blocks
// the API). It receives the points as transferred buffers, posts throttled progress, then the
// result (raster transferred), and exits. The database stays with the main thread: SQLite has one
// writer, and the test database is in memory.

/** Message the main thread sends once. */
export interface ComputeSurfaceInput {
  mode: 'compute' | 'plan';
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
  params: SurfaceParams;
}

/** Messages the worker posts back. */
export type ComputeSurfaceMessage =
  | { type: 'progress'; fraction: number }
  | { type: 'result'; result: ReturnType<typeof surfaceCompute> }
  | { type: 'plan'; plan: SurfacePlanSummary }
  | { type: 'error'; code: string; message: string; field?: string; details?: Record<string, unknown>; input: boolean };

/** Progress messages are at least this far apart (ms). */
const PROGRESS_INTERVAL_MS = 250;

const port = parentPort;
if (port) {
  port.once('message', (input: ComputeSurfaceInput) => {
    let last = 0;
    const progress = (fraction: number): void => {
      const now = Date.now();
      if (now - last < PROGRESS_INTERVAL_MS) return;
      last = now;
      port.postMessage({ type: 'progress', fraction } satisfies ComputeSurfaceMessage);
    };
    try {
      if (input.mode === 'plan') {
        port.postMessage({ type: 'plan', plan: surfacePlanSummary(surfacePlan(input.lon, input.lat, input.w, input.params)) } satisfies ComputeSurfaceMessage);
      } else {
        const result = surfaceCompute(input.lon, input.lat, input.w, input.params, progress);
        port.postMessage({ type: 'result', result } satisfies ComputeSurfaceMessage, [result.raster.buffer as ArrayBuffer]);
      }
    } catch (err) {
      const message: ComputeSurfaceMessage = isCoreError(err)
        ? { type: 'error', code: err.code, message: err.message, field: err.field, details: err.details, input: true }
        : { type: 'error', code: 'ENGINE_ERROR', message: `the density engine failed: ${(err as Error).message}`, input: false };
      port.postMessage(message);
    }
    port.close();
  });
}

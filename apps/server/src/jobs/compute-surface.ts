import { parentPort } from 'node:worker_threads';
import { isCoreError } from '@demandscape/core';
import { surfaceCompute } from '../modules/surface/surface-compute.js';
import type { SurfaceParams } from '../modules/surface/surface.schemas.js';

// Worker thread of one surface run (started by SurfaceRunner through Bree). It receives the points
// as transferred buffers, posts throttled progress, then the result (raster transferred), and exits.
// The database stays with the runner: SQLite has one writer, and the test database is in memory.

/** Message the runner sends once. */
export interface ComputeSurfaceInput {
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
  params: SurfaceParams;
}

/** Messages the worker posts back. */
export type ComputeSurfaceMessage =
  | { type: 'progress'; fraction: number }
  | { type: 'result'; result: ReturnType<typeof surfaceCompute> }
  | { type: 'error'; code: string; message: string };

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
      const result = surfaceCompute(input.lon, input.lat, input.w, input.params, progress);
      port.postMessage({ type: 'result', result } satisfies ComputeSurfaceMessage, [result.raster.buffer as ArrayBuffer]);
    } catch (err) {
      const message: ComputeSurfaceMessage = isCoreError(err)
        ? { type: 'error', code: err.code, message: err.message }
        : { type: 'error', code: 'ENGINE_ERROR', message: `the density engine failed: ${(err as Error).message}` };
      port.postMessage(message);
    }
    port.close();
  });
}

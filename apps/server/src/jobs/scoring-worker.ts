import { fileURLToPath } from 'node:url';
import { parentPort } from 'node:worker_threads';
import { isCoreError, type SiteScoresPart } from '@demandscape/core';
import { scoringCompute, scoringPartCompute, type ScoringComputeInput } from '../modules/scoring/scoring-compute.js';
import { scoringSetCompute, type SiteSetParts } from '../modules/scoring/scoring-set.js';
import { scoringStabilityCompute, type StabilityComputeInput } from '../modules/scoring/scoring-stability.js';
import type { ScoringResultsJson, StabilityJson } from '../modules/scoring/scoring.types.js';

// Worker thread of one scoring job: score a run, check its rank stability, or score a set of
// candidates. It receives the surface raster (and for stability the customer points) as
// transferred buffers, posts throttled progress, then one result, and exits. The database stays
// with the main thread.

/** The one message the main thread sends. */
export type ScoringWorkerInput =
  | { mode: 'score'; input: ScoringComputeInput }
  | { mode: 'part'; input: ScoringComputeInput; rows: [number, number] }
  | { mode: 'stability'; input: StabilityComputeInput }
  | { mode: 'set'; input: ScoringComputeInput; siteIds: string[] };

/** Messages the worker posts back. */
export type ScoringWorkerMessage =
  | { type: 'progress'; fraction: number }
  | { type: 'score'; results: ScoringResultsJson; warnings: string[]; timings: Record<string, number> }
  | { type: 'part'; part: SiteScoresPart }
  | { type: 'stability'; stability: StabilityJson }
  | { type: 'set'; set: SiteSetParts }
  | { type: 'error'; code: string; message: string; field?: string };

/** Progress messages are at least this far apart (ms). */
const PROGRESS_INTERVAL_MS = 200;

/**
 * This job file (compiled `.js`, or `.ts` when running from source), for `workerStart`.
 * @returns absolute path
 * @example
 * workerStart(scoringWorkerFile());
 */
export function scoringWorkerFile(): string {
  const ext = import.meta.url.endsWith('.ts') ? '.ts' : '.js';
  return fileURLToPath(new URL(`./scoring-worker${ext}`, import.meta.url));
}

const port = parentPort;
if (port) {
  port.once('message', (job: ScoringWorkerInput) => {
    let last = 0;
    const progress = (fraction: number): void => {
      const now = Date.now();
      if (now - last < PROGRESS_INTERVAL_MS) return;
      last = now;
      port.postMessage({ type: 'progress', fraction } satisfies ScoringWorkerMessage);
    };
    try {
      if (job.mode === 'score') {
        port.postMessage({ type: 'score', ...scoringCompute(job.input, progress) } satisfies ScoringWorkerMessage);
      } else if (job.mode === 'part') {
        const part = scoringPartCompute(job.input, job.rows, progress);
        const buffers = [part.ownToday, part.captured, part.cannibalization, part.rings, part.cannibalizedFrom].filter((a) => a !== null).map((a) => a.buffer as ArrayBuffer);
        port.postMessage({ type: 'part', part } satisfies ScoringWorkerMessage, buffers);
      } else if (job.mode === 'stability') {
        port.postMessage({ type: 'stability', stability: scoringStabilityCompute(job.input) } satisfies ScoringWorkerMessage);
      } else {
        port.postMessage({ type: 'set', set: scoringSetCompute(job.input, job.siteIds) } satisfies ScoringWorkerMessage);
      }
    } catch (err) {
      const message: ScoringWorkerMessage = isCoreError(err)
        ? { type: 'error', code: err.code, message: err.message, field: err.field }
        : { type: 'error', code: 'ENGINE_ERROR', message: `the scoring engine failed: ${(err as Error).message}` };
      port.postMessage(message);
    }
    port.close();
  });
}

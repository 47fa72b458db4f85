import type { Worker } from 'node:worker_threads';
import { scoringWorkerFile, type ScoringWorkerInput, type ScoringWorkerMessage } from './scoring-worker.js';
import { workerAnswer } from './worker-answer.js';

/** The one answer of a scoring worker (anything but progress). */
export type ScoringWorkerOutcome = Exclude<ScoringWorkerMessage, { type: 'progress' }>;

/**
 * Starts one scoring worker thread for one job and waits for its answer; the worker is
 * terminated once it answered, failed or exited.
 * @param job what to compute
 * @param transfer buffers to move into the worker (do not use them afterwards)
 * @param onProgress receives 0–1
 * @returns the worker (to terminate it early) and its outcome (rejects when the worker dies)
 * @example
 * const { outcome } = scoringWorkerRun({ mode: 'score', input }, [input.raster.buffer]);
 */
export function scoringWorkerRun(job: ScoringWorkerInput, transfer: ArrayBuffer[], onProgress?: (f: number) => void): { worker: Worker; outcome: Promise<ScoringWorkerOutcome> } {
  const { worker, answer } = workerAnswer<ScoringWorkerMessage, ScoringWorkerOutcome>(
    scoringWorkerFile(),
    job,
    transfer,
    (m) => {
      if (m.type !== 'progress') return { value: m };
      onProgress?.(m.fraction);
      return undefined;
    },
    'scoring',
  );
  return { worker, outcome: answer };
}

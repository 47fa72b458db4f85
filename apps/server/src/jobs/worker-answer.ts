import type { Worker } from 'node:worker_threads';
import { workerStart } from './surface-worker-start.js';

/** What a message means to the caller: the answer, a failure, or nothing yet (e.g. progress). */
export type WorkerVerdict<R> = { value: R } | { error: Error } | undefined;

/**
 * Starts a worker thread on a job file, posts it one job and waits for the message that answers
 * it; the worker is terminated once it answered, failed or exited.
 * @param filename the job file (see workerStart)
 * @param job the message to post
 * @param transfer buffers moved into the worker (do not use them afterwards)
 * @param verdict reads each message: `{ value }` resolves, `{ error }` rejects, undefined waits on
 * @param what the job in words, for the error when the worker stops without answering
 * @returns the worker (to terminate it early) and the answer
 * @example
 * const { answer } = workerAnswer(file, job, [], (m) => (m.type === 'done' ? { value: m } : undefined), 'scoring');
 */
export function workerAnswer<M, R>(
  filename: string,
  job: unknown,
  transfer: ArrayBuffer[],
  verdict: (message: M) => WorkerVerdict<R>,
  what: string,
): { worker: Worker; answer: Promise<R> } {
  const worker = workerStart(filename);
  const answer = new Promise<R>((resolve, reject) => {
    let settled = false;
    const done = (fn: () => void): void => {
      if (settled) return;
      settled = true;
      fn();
      void worker.terminate();
    };
    worker.on('message', (m: M) => {
      const v = verdict(m);
      if (v && 'value' in v) done(() => resolve(v.value));
      else if (v) done(() => reject(v.error));
    });
    worker.on('error', (err) => done(() => reject(err)));
    worker.on('exit', (code) => done(() => reject(new Error(`the ${what} worker stopped (exit code ${code})`))));
    worker.postMessage(job, transfer);
  });
  return { worker, answer };
}

import { fileURLToPath } from 'node:url';
import { Worker, type WorkerOptions } from 'node:worker_threads';
import Bree from 'bree';

/**
 * Starts a worker thread for a job file; `.ts` files (tests, `tsx` dev runs) register the tsx
 * loader first, built `.js` files run directly.
 * @param filename absolute path of the job file
 * @param options worker options
 * @returns the worker
 * @example
 * const w = workerStart(computeSurfaceFile(), {});
 */
export function workerStart(filename: string, options: Partial<WorkerOptions> = {}): Worker {
  if (!filename.endsWith('.ts')) return new Worker(filename, options);
  const entry = new URL(`file://${filename}`).href;
  const code = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
  return new Worker(code, { ...options, eval: true });
}

/**
 * The surface job file next to this module (compiled `.js`, or `.ts` when running from source).
 * @returns absolute path
 * @example
 * workerStart(computeSurfaceFile());
 */
export function computeSurfaceFile(): string {
  const ext = import.meta.url.endsWith('.ts') ? '.ts' : '.js';
  return fileURLToPath(new URL(`./compute-surface${ext}`, import.meta.url));
}

/**
 * A Bree instance for per-run jobs that can also start TypeScript job files, through Bree's
 * documented extension point for extra `acceptedExtensions` (`createWorker`).
 *
 * @param logger where Bree's own messages go
 * @returns the Bree instance (no root folder; jobs are added per run)
 * @example
 * const bree = surfaceBreeCreate({ info() {}, warn() {}, error() {} });
 */
export function surfaceBreeCreate(logger: { info: (...a: unknown[]) => void; warn: (...a: unknown[]) => void; error: (...a: unknown[]) => void }): Bree {
  const bree = new Bree({ root: false, doRootCheck: false, jobs: [], logger, acceptedExtensions: ['.js', '.mjs', '.ts'], errorHandler: () => {} });
  bree.createWorker = (filename: string, options: Partial<WorkerOptions>): Worker => workerStart(filename, options);
  return bree;
}

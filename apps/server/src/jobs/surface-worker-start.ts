import { Worker, type WorkerOptions } from 'node:worker_threads';
import Bree from 'bree';

/**
 * A Bree instance for per-run jobs that also starts TypeScript job files (tests and `tsx` dev
 * runs): `.ts` workers register the tsx loader first. Built code runs the compiled `.js` directly.
 * This is Bree's documented extension point for extra `acceptedExtensions` (`createWorker`).
 *
 * @param logger where Bree's own messages go
 * @returns the Bree instance (no root folder; jobs are added per run)
 * @example
 * const bree = surfaceBreeCreate({ info() {}, warn() {}, error() {} });
 */
export function surfaceBreeCreate(logger: { info: (...a: unknown[]) => void; warn: (...a: unknown[]) => void; error: (...a: unknown[]) => void }): Bree {
  const bree = new Bree({ root: false, doRootCheck: false, jobs: [], logger, acceptedExtensions: ['.js', '.mjs', '.ts'], errorHandler: () => {} });
  bree.createWorker = (filename: string, options: Partial<WorkerOptions>): Worker => {
    if (!filename.endsWith('.ts')) return new Worker(filename, options);
    const entry = new URL(`file://${filename}`).href;
    const code = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
    return new Worker(code, { ...options, eval: true });
  };
  return bree;
}

import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import type { Worker } from 'node:worker_threads';
import type { MikroORM } from '@mikro-orm/sqlite';
import type { Logger } from 'pino';
import { AppError } from '../modules/common/errors.js';
import { scoringInputLoad, scoringStabilityInputLoad } from '../modules/scoring/scoring-input.js';
import { ScoringRunSchema } from '../modules/scoring/scoring-run.entity.js';
import { scoringRecoverStale, scoringStabilityFail, SCORING_STALE_MS } from '../modules/scoring/scoring-run.repository.js';
import { scoringJoin, scoringWork, type ScoringComputeInput, type ScoringComputeOutput } from '../modules/scoring/scoring-compute.js';
import type { SiteSetParts } from '../modules/scoring/scoring-set.js';
import type { ScoringWorkerInput } from './scoring-worker.js';
import { scoringWorkerRun, type ScoringWorkerOutcome } from './scoring-worker-run.js';

/** Runner settings. */
export interface ScoringRunnerOptions {
  /** Worker threads at a time in this process (RUNNER_CONCURRENCY). */
  concurrency: number;
  /** Heartbeat interval for this process's rows, ms (default 1000). */
  heartbeatMs?: number;
  /** A claimed row whose heartbeat is older than this belongs to a dead process, ms (default 30,000). */
  staleMs?: number;
  /**
   * Runs with at least this many cell × candidate × (own stores + 1) terms are split by grid rows
   * over two worker threads when a second slot is free (default 1e9 ≈ a second or more of Huff passes,
   * where the second thread pays for its start; 0 splits every run).
   */
  splitMinWork?: number;
  log: Logger;
}

type Outcome = ScoringWorkerOutcome;

/** Progress rows are written at least this far apart (ms). */
const PROGRESS_WRITE_MS = 250;

/**
 * Computes scoring runs, rank-stability checks and candidate sets off the request thread: one
 * node:worker_threads Worker per job (no Bree schedule: scoring jobs are short and start at once),
 * at most `concurrency` at a time. Rows it works on carry its id and a heartbeat; rows of a dead
 * process are failed with a reason (at start and lazily when read). Scoring spends no credits.
 *
 * @example
 * const runner = new ScoringRunner(orm, { concurrency: 2, log });
 * await runner.start(); runner.scoreEnqueue(runId); … await runner.stop();
 */
export class ScoringRunner {
  /** This runner's claim id: host, process and a random part. */
  readonly id = `scoring:${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  private readonly workers = new Map<string, { runId: string | null; worker: Worker }>();
  private readonly waiting: Array<() => void> = [];
  private running = 0;
  private timer: NodeJS.Timeout | null = null;
  private stopped = true;
  private readonly jobs = new Set<Promise<void>>();

  constructor(
    private readonly orm: MikroORM,
    private readonly options: ScoringRunnerOptions,
  ) {}

  /** A claimed row whose heartbeat is older than this many ms is orphaned. */
  get staleMs(): number {
    return this.options.staleMs ?? SCORING_STALE_MS;
  }

  /**
   * Fails rows orphaned by a stopped process, then beats for this process's rows.
   * @returns once the recovery is written
   * @example
   * await runner.start();
   */
  async start(): Promise<void> {
    if (!this.stopped) return;
    this.stopped = false;
    const recovered = await scoringRecoverStale(this.orm.em.fork(), Date.now() - this.staleMs);
    if (recovered > 0) this.options.log.warn({ count: recovered }, 'failed scoring work orphaned by a stopped server');
    this.timer = setInterval(() => void this.beat(), this.options.heartbeatMs ?? 1000);
    this.timer.unref();
  }

  /**
   * Stops: terminates workers and fails this process's unfinished rows with a reason.
   * @returns once everything is stopped
   * @example
   * await runner.stop();
   */
  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    // Fail this process's rows first (with the reason), so the terminated jobs find nothing to write.
    await scoringRecoverStale(this.orm.em.fork(), Number.POSITIVE_INFINITY, this.id).catch((err) => this.options.log.warn({ err }, 'scoring stop cleanup failed'));
    for (const release of this.waiting.splice(0)) release();
    await Promise.all([...this.workers.values()].map((w) => w.worker.terminate()));
    await Promise.allSettled([...this.jobs]);
  }

  /**
   * Scores a queued run in the background (the row is claimed by this runner already).
   * @param runId the run
   * @returns nothing (the outcome is written to the row)
   * @example
   * runner.scoreEnqueue(run.id);
   */
  scoreEnqueue(runId: string): void {
    this.track(this.score(runId));
  }

  /**
   * Checks a run's rank stability in the background (stability.status is 'running' already).
   * @param runId the run
   * @returns nothing (the outcome is written to the row's stability)
   * @example
   * runner.stabilityEnqueue(run.id);
   */
  stabilityEnqueue(runId: string): void {
    this.track(this.stability(runId));
  }

  /**
   * Scores a set of candidates opened together in a worker and waits for it.
   * @param input the run's scoring input
   * @param siteIds candidate ids
   * @returns the set's numbers
   * @throws AppError 400 for engine input errors
   * @example
   * const parts = await runner.setScore(input, ['c1', 'c2']);
   */
  async setScore(input: ScoringComputeInput, siteIds: string[]): Promise<SiteSetParts> {
    const m = await this.withSlot(() => this.work(null, { mode: 'set', input, siteIds }, [input.raster.buffer as ArrayBuffer]));
    if (m.type === 'set') return m.set;
    if (m.type === 'error') throw new AppError(400, m.code, m.message, m.field);
    throw new Error(`unexpected worker answer ${m.type}`);
  }

  /**
   * Terminates the workers of a run (before it is deleted).
   * @param runId the run
   * @returns once they are gone
   * @example
   * await runner.cancel(runId);
   */
  async cancel(runId: string): Promise<void> {
    await Promise.all([...this.workers.values()].filter((w) => w.runId === runId).map((w) => w.worker.terminate()));
  }

  /** Resolves when every background job has finished (tests). */
  async idle(): Promise<void> {
    while (this.jobs.size > 0) await Promise.allSettled([...this.jobs]);
  }

  private track(p: Promise<void>): void {
    const job = p.catch((err) => this.options.log.error({ err }, 'scoring job failed')).finally(() => this.jobs.delete(job));
    this.jobs.add(job);
  }

  private async beat(): Promise<void> {
    try {
      await this.orm.em.fork().nativeUpdate(ScoringRunSchema, { claimedBy: this.id }, { heartbeatAt: new Date() });
    } catch (err) {
      this.options.log.warn({ err }, 'scoring heartbeat failed');
    }
  }

  private async withSlot<T>(fn: () => Promise<T>): Promise<T> {
    if (this.stopped) throw new AppError(503, 'SERVER_STOPPING', 'The server is stopping; try again in a moment.');
    if (this.running >= Math.max(1, this.options.concurrency)) await new Promise<void>((r) => this.waiting.push(r));
    if (this.stopped) throw new AppError(503, 'SERVER_STOPPING', 'The server is stopping; try again in a moment.');
    this.running++;
    try {
      return await fn();
    } finally {
      this.running--;
      this.waiting.shift()?.();
    }
  }

  private work(runId: string | null, job: ScoringWorkerInput, transfer: ArrayBuffer[], onProgress?: (f: number) => void): Promise<Outcome> {
    const key = randomUUID();
    const { worker, outcome } = scoringWorkerRun(job, transfer, onProgress);
    this.workers.set(key, { runId, worker });
    return outcome.finally(() => this.workers.delete(key));
  }


  private async score(runId: string): Promise<void> {
    const claim = { id: runId, claimedBy: this.id };
    const fail = async (code: string, message: string): Promise<void> => {
      await this.orm.em.fork().nativeUpdate(ScoringRunSchema, { ...claim, status: { $in: ['queued', 'running'] } }, { status: 'failed', error: { code, message }, finishedAt: new Date(), claimedBy: null });
    };
    try {
      await this.withSlot(async () => {
        const em = this.orm.em.fork();
        const started = await em.nativeUpdate(ScoringRunSchema, { ...claim, status: 'queued' }, { status: 'running', startedAt: new Date(), heartbeatAt: new Date() });
        if (started === 0) return; // deleted (or failed by a stop) while waiting
        const run = await em.findOneOrFail(ScoringRunSchema, runId, { populate: ['sites'] });
        const input = await scoringInputLoad(em, run);
        let lastWrite = 0;
        const onProgress = (f: number): void => {
          const now = Date.now();
          if (now - lastWrite < PROGRESS_WRITE_MS) return;
          lastWrite = now;
          void this.orm.em.fork().nativeUpdate(ScoringRunSchema, { ...claim, status: 'running' }, { progress: Math.min(0.99, f) }).catch(() => {});
        };
        const m = await this.scoreOrSplit(runId, input, onProgress);
        if (m.type === 'score') {
          await this.orm.em.fork().nativeUpdate(
            ScoringRunSchema,
            { ...claim, status: 'running' },
            { status: 'succeeded', progress: 1, results: m.results, warnings: [...run.warnings, ...m.warnings], timings: m.timings, finishedAt: new Date(), claimedBy: null, error: null },
          );
        } else if (m.type === 'error') await fail(m.code, m.message);
        else await fail('ENGINE_ERROR', `the scoring worker answered ${m.type}`);
      });
    } catch (err) {
      const e = err as AppError;
      await fail(e.code && e.status ? e.code : 'ENGINE_ERROR', e.code && e.status ? e.message : `scoring stopped: ${e.message}`);
    }
  }

  /**
   * One worker, or — for a large run when a second slot is free — two workers over the two
   * halves of the grid rows, joined here (every score is a sum over cells).
   */
  private async scoreOrSplit(runId: string, input: ScoringComputeInput, onProgress: (f: number) => void): Promise<Outcome> {
    const h = input.grid.height;
    const split = h >= 2 && this.running < this.options.concurrency && scoringWork(input) >= (this.options.splitMinWork ?? 1e9);
    if (!split) return this.work(runId, { mode: 'score', input }, [input.raster.buffer as ArrayBuffer], onProgress);
    this.running++;
    try {
      const t = performance.now();
      const mid = Math.floor(h / 2);
      const fractions = [0, 0];
      const halves = ([[0, mid], [mid, h]] as [number, number][]).map((rows, k) => {
        const own = { ...input, raster: input.raster.slice() };
        return this.work(runId, { mode: 'part', input: own, rows }, [own.raster.buffer as ArrayBuffer], (f) => {
          fractions[k] = f;
          onProgress((fractions[0] + fractions[1]) / 2);
        });
      });
      const answers = await Promise.all(halves);
      const failed = answers.find((a) => a.type !== 'part');
      if (failed) return failed;
      const out: ScoringComputeOutput = scoringJoin(input, answers.map((a) => (a as Extract<Outcome, { type: 'part' }>).part), Number(((performance.now() - t) / 1000).toFixed(3)));
      return { type: 'score', ...out, timings: { ...out.timings, threads: 2 } };
    } finally {
      this.running--;
      this.waiting.shift()?.();
    }
  }

  private async stability(runId: string): Promise<void> {
    const em0 = this.orm.em.fork();
    try {
      await this.withSlot(async () => {
        const em = this.orm.em.fork();
        const run = await em.findOne(ScoringRunSchema, { id: runId, claimedBy: this.id }, { populate: ['sites'] });
        if (!run || run.stability?.status !== 'running') return;
        const input = await scoringStabilityInputLoad(em, run);
        const m = await this.work(runId, { mode: 'stability', input }, [input.raster.buffer, input.lon.buffer, input.lat.buffer, input.w.buffer] as ArrayBuffer[]);
        if (m.type === 'stability') {
          await this.orm.em.fork().nativeUpdate(ScoringRunSchema, { id: runId, claimedBy: this.id }, { stability: m.stability, claimedBy: null });
        } else if (m.type === 'error') await scoringStabilityFail(em0, runId, this.id, m.code, m.message);
        else await scoringStabilityFail(em0, runId, this.id, 'ENGINE_ERROR', `the stability worker answered ${m.type}`);
      });
    } catch (err) {
      const e = err as AppError;
      const known = Boolean(e.code && e.status);
      await scoringStabilityFail(em0, runId, this.id, known ? e.code : 'ENGINE_ERROR', known ? e.message : `the stability check stopped: ${e.message}`);
    }
  }
}

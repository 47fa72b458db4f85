import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import type { Worker } from 'node:worker_threads';
import type { MikroORM } from '@mikro-orm/sqlite';
import type Bree from 'bree';
import type { Logger } from 'pino';
import type { ComputeSurfaceInput, ComputeSurfaceMessage } from './compute-surface.js';
import { computeSurfaceFile, surfaceBreeCreate } from './surface-worker-start.js';
import { customerPointsLoad } from '../modules/customer-file/customer-points.js';
import type { Mailer } from '../modules/mail/mailer.js';
import { surfaceCreditsCharge, surfaceCreditsRelease } from '../modules/surface/surface-credits.js';
import { SurfaceRasterSchema, SurfaceSchema, type Surface } from '../modules/surface/surface.entity.js';
import { surfaceFinishedMail } from '../modules/surface/surface-mail.js';
import { surfaceClaimNext, surfaceHeartbeat, surfaceRecoverStale, surfaceRequeueOwn } from '../modules/surface/surface.repository.js';
import type { SurfaceComputeResult } from '../modules/surface/surface-compute.js';

/** Runner settings. */
export interface SurfaceRunnerOptions {
  /** Runs at a time in this process (RUNNER_CONCURRENCY, default os.availableParallelism()). */
  concurrency: number;
  /** Queue poll interval, ms (default 500). */
  pollMs?: number;
  /** Heartbeat interval for running rows, ms (default 1000). */
  heartbeatMs?: number;
  /** A running row whose heartbeat is older than this belongs to a dead process, ms (default 30,000). */
  staleMs?: number;
  log: Logger;
  mailer: Mailer;
  publicUrl: string;
}

interface Active {
  worker: Worker;
  jobName: string;
  lastProgressWrite: number;
  /** Set once the outcome is written (or the run is known cancelled/deleted): exit needs no action. */
  settled: boolean;
}

/** Progress rows are written at least this far apart (ms). */
const PROGRESS_WRITE_MS = 250;

/**
 * Runs queued demand surfaces in worker threads (through Bree). Claims rows atomically (several
 * processes may share one database), writes throttled progress and the results, heartbeats its
 * running rows, stops workers of runs cancelled or deleted elsewhere, recovers runs orphaned by
 * a dead process, and e-mails the creator when a run ends.
 *
 * @example
 * const runner = new SurfaceRunner(orm, { concurrency: 2, log, mailer, publicUrl });
 * await runner.start(); … await runner.stop();
 */
export class SurfaceRunner {
  /** This runner's claim id: host, process and a random part. */
  readonly id = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  private readonly active = new Map<string, Active>();
  private bree: Bree | null = null;
  private timer: NodeJS.Timeout | null = null;
  private ticking: Promise<void> | null = null;
  private again = false;
  private lastHeartbeat = 0;
  private lastRecovery = 0;
  private stopped = true;

  constructor(
    private readonly orm: MikroORM,
    private readonly options: SurfaceRunnerOptions,
  ) {}

  private get staleMs(): number {
    return this.options.staleMs ?? 30_000;
  }

  /**
   * Recovers orphaned runs, then polls the queue.
   * @returns once the first poll is done
   * @example
   * await runner.start();
   */
  async start(): Promise<void> {
    if (!this.stopped) return;
    this.stopped = false;
    this.bree = surfaceBreeCreate({
      info: () => {},
      warn: (...a) => this.options.log.warn({ component: 'bree' }, String(a[0])),
      error: (...a) => this.options.log.error({ component: 'bree' }, String(a[0])),
    });
    this.timer = setInterval(() => this.wake(), this.options.pollMs ?? 500);
    this.timer.unref();
    await this.tick();
  }

  /**
   * Polls now (after an enqueue or a cancel) instead of waiting for the next interval.
   * @returns nothing
   * @example
   * runner.wake();
   */
  wake(): void {
    if (this.stopped) return;
    void this.tick();
  }

  /** Ids of the runs this runner has a worker for. */
  runningIds(): string[] {
    return [...this.active.keys()];
  }

  /**
   * Stops polling, terminates workers and puts their runs back in the queue (not counted as an attempt).
   * @returns once everything is stopped
   * @example
   * await runner.stop();
   */
  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.ticking?.catch(() => {});
    const workers = [...this.active.values()];
    for (const a of workers) a.settled = true;
    await Promise.all(workers.map((a) => a.worker.terminate()));
    this.active.clear();
    await surfaceRequeueOwn(this.orm.em.fork(), this.id).catch((err) => this.options.log.warn({ err }, 'surface requeue on stop failed'));
  }

  /**
   * Simulates a crash for tests: workers die and the runner stops beating without touching the rows.
   * @returns once the workers are gone
   * @example
   * await runner.kill();
   */
  async kill(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.ticking?.catch(() => {});
    const workers = [...this.active.values()];
    for (const a of workers) a.settled = true;
    await Promise.all(workers.map((a) => a.worker.terminate()));
    this.active.clear();
  }

  private tick(): Promise<void> {
    if (this.ticking) {
      this.again = true;
      return this.ticking;
    }
    this.ticking = (async () => {
      do {
        this.again = false;
        try {
          await this.tickOnce();
        } catch (err) {
          this.options.log.error({ err }, 'surface runner poll failed');
        }
      } while (this.again && !this.stopped);
    })().finally(() => {
      this.ticking = null;
    });
    return this.ticking;
  }

  private async tickOnce(): Promise<void> {
    const em = this.orm.em.fork();
    const now = Date.now();
    if (now - this.lastHeartbeat >= (this.options.heartbeatMs ?? 1000) || this.active.size > 0) {
      this.lastHeartbeat = now;
      const seen = await surfaceHeartbeat(em, this.id, this.runningIds());
      for (const [id, a] of this.active) {
        const row = seen.get(id);
        if (!row || row.status !== 'running' || row.claimedBy !== this.id) {
          // Cancelled or deleted (here or in another process): stop the work; nothing to write.
          a.settled = true;
          this.active.delete(id);
          void a.worker.terminate();
        }
      }
    }
    if (now - this.lastRecovery >= this.staleMs / 2) {
      this.lastRecovery = now;
      const { requeued, failed } = await surfaceRecoverStale(em, now - this.staleMs);
      if (requeued.length) this.options.log.warn({ ids: requeued }, 'requeued surface runs orphaned by a stopped server');
      for (const id of failed) await this.afterFailure(id);
    }
    while (!this.stopped && this.active.size < this.options.concurrency) {
      const id = await surfaceClaimNext(em, this.id);
      if (!id) break;
      await this.launch(id);
    }
  }

  private async launch(id: string): Promise<void> {
    const em = this.orm.em.fork();
    const surface = await em.findOneOrFail(SurfaceSchema, id);
    if (!surface.customerFileId) {
      await this.finishFailed(id, 'FILE_DELETED', 'the customer file of this surface was deleted; create a new surface from another file');
      return;
    }
    const points = await customerPointsLoad(em, surface.customerFileId);
    const jobName = `surface-${id}`;
    const bree = this.bree!;
    await bree.add({ name: jobName, path: computeSurfaceFile() });
    await bree.run(jobName);
    const worker = bree.workers.get(jobName);
    if (!worker) throw new Error(`Bree did not start the worker for ${jobName}`);
    const a: Active = { worker, jobName, lastProgressWrite: 0, settled: false };
    this.active.set(id, a);
    worker.on('message', (m: ComputeSurfaceMessage) => void this.onMessage(id, a, m));
    worker.on('error', (err) => this.options.log.error({ err, surfaceId: id }, 'surface worker error'));
    worker.on('exit', () => void this.onExit(id, a));
    const input: ComputeSurfaceInput = { mode: 'compute', lon: points.lon, lat: points.lat, w: points.w, params: surface.params };
    worker.postMessage(input, [points.lon.buffer, points.lat.buffer, points.w.buffer] as ArrayBuffer[]);
  }

  private async onMessage(id: string, a: Active, m: ComputeSurfaceMessage): Promise<void> {
    try {
      if (m.type === 'progress') {
        const now = Date.now();
        if (a.settled || now - a.lastProgressWrite < PROGRESS_WRITE_MS) return;
        a.lastProgressWrite = now;
        await this.orm.em.fork().nativeUpdate(SurfaceSchema, { id, status: 'running', claimedBy: this.id }, { progress: Math.min(0.99, m.fraction) });
      } else if (m.type === 'result') {
        a.settled = true;
        await this.finishSucceeded(id, m.result);
      } else if (m.type === 'error') {
        a.settled = true;
        await this.finishFailed(id, m.code, m.message);
      }
    } catch (err) {
      this.options.log.error({ err, surfaceId: id }, 'writing a surface result failed');
    }
  }

  private async onExit(id: string, a: Active): Promise<void> {
    if (this.active.get(id) === a) this.active.delete(id);
    await this.bree?.remove(a.jobName).catch(() => {});
    if (!a.settled && !this.stopped) {
      a.settled = true;
      await this.finishFailed(id, 'WORKER_EXITED', 'the computation stopped unexpectedly (out of memory?); retry, or use a larger cell size or a smaller study area').catch(
        (err) => this.options.log.error({ err, surfaceId: id }, 'marking a surface failed did not work'),
      );
    }
    this.wake();
  }

  private async finishSucceeded(id: string, r: SurfaceComputeResult): Promise<void> {
    const finished = await this.orm.em.fork().transactional(async (em) => {
      const now = new Date();
      const changed = await em.nativeUpdate(
        SurfaceSchema,
        { id, status: 'running', claimedBy: this.id },
        {
          status: 'succeeded',
          progress: 1,
          finishedAt: now,
          resolved: r.resolved,
          stats: r.stats,
          thresholds: r.thresholds,
          timings: r.timings,
          error: null,
          claimedBy: null,
        },
      );
      // Cancelled or deleted while the result was on its way: keep that decision.
      if (changed === 0) return false;
      await em.nativeDelete(SurfaceRasterSchema, { surface: id });
      await em.insert(SurfaceRasterSchema, {
        id: randomUUID(),
        createdAt: now,
        updatedAt: now,
        surface: id,
        kind: 'intensity',
        width: r.width,
        height: r.height,
        data: Buffer.from(r.raster.buffer, r.raster.byteOffset, r.raster.byteLength),
        contours: r.contours,
      } as never);
      const surface = await em.findOneOrFail(SurfaceSchema, id);
      await surfaceCreditsCharge(em, surface);
      return true;
    });
    if (finished) await this.mail(id);
  }

  private async finishFailed(id: string, code: string, message: string): Promise<void> {
    const em = this.orm.em.fork();
    const changed = await em.nativeUpdate(
      SurfaceSchema,
      { id, status: 'running', claimedBy: this.id },
      { status: 'failed', finishedAt: new Date(), error: { code, message }, claimedBy: null },
    );
    if (changed > 0) await this.afterFailure(id);
  }

  private async afterFailure(id: string): Promise<void> {
    const em = this.orm.em.fork();
    const surface = await em.findOne(SurfaceSchema, id);
    if (!surface) return;
    await surfaceCreditsRelease(em, surface);
    await em.flush();
    await this.mail(id);
  }

  private async mail(id: string): Promise<void> {
    const em = this.orm.em.fork();
    const surface: Surface | null = await em.findOne(SurfaceSchema, id, { populate: ['createdBy', 'workspace'] });
    if (!surface?.createdBy) return;
    await this.options.mailer.send(surfaceFinishedMail(surface, this.options.publicUrl));
  }
}

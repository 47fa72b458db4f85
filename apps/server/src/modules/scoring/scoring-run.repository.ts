import type { EntityManager } from '@mikro-orm/sqlite';
import { NotFoundError } from '../common/errors.js';
import { ScoringRunSchema, type ScoringRun } from './scoring-run.entity.js';
import type { ScoringScope } from './scoring-scope.js';

/**
 * One run of the workspace with its sites and results, or 404 (also for other organizations' ids).
 * @param em entity manager
 * @param scope organization and workspace
 * @param runId the run
 * @returns the run
 * @throws NotFoundError
 * @example
 * const run = await scoringRunLoad(em, scope, id);
 */
export async function scoringRunLoad(em: EntityManager, scope: ScoringScope, runId: string): Promise<ScoringRun> {
  const run = await em.findOne(
    ScoringRunSchema,
    { id: runId, organization: scope.organizationId, workspace: scope.workspaceId },
    { populate: ['createdBy', 'sites', 'results'], refresh: true },
  );
  if (!run) throw new NotFoundError('Scoring run');
  return run;
}

/**
 * Runs of a workspace, newest first (without sites and results).
 * @param em entity manager
 * @param scope organization and workspace (checked by the caller)
 * @returns the runs
 * @example
 * const runs = await scoringRunsOfWorkspace(em, scope);
 */
export async function scoringRunsOfWorkspace(em: EntityManager, scope: ScoringScope): Promise<ScoringRun[]> {
  return em.find(ScoringRunSchema, { organization: scope.organizationId, workspace: scope.workspaceId }, { populate: ['createdBy'], orderBy: { createdAt: 'desc', id: 'desc' } });
}

/** Why orphaned work failed. */
export const SCORING_ORPHANED = {
  code: 'SERVER_RESTARTED',
  message: 'The server stopped while this was being computed; nothing was charged. Start it again.',
} as const;

/**
 * Fails work whose process is gone: claimed rows with a heartbeat older than `staleBefore` (or, with
 * `claimedBy`, every row of that runner). Unfinished runs become failed; a running stability check
 * becomes failed and the run's results stay.
 * @param em entity manager
 * @param staleBefore epoch ms; Infinity = regardless of heartbeat
 * @param claimedBy only rows of this runner
 * @returns how many rows were changed
 * @example
 * await scoringRecoverStale(em, Date.now() - 30_000);
 */
export async function scoringRecoverStale(em: EntityManager, staleBefore: number, claimedBy?: string): Promise<number> {
  const rows = await em.find(ScoringRunSchema, {
    claimedBy: claimedBy ?? { $ne: null },
    ...(Number.isFinite(staleBefore) ? { $or: [{ heartbeatAt: { $lt: new Date(staleBefore) } }, { heartbeatAt: null }] } : {}),
  });
  let changed = 0;
  for (const r of rows) {
    const where = { id: r.id, claimedBy: r.claimedBy };
    if (r.status === 'queued' || r.status === 'running') {
      changed += await em.nativeUpdate(ScoringRunSchema, where, { status: 'failed', error: { ...SCORING_ORPHANED }, finishedAt: new Date(), claimedBy: null });
    } else if (r.stability?.status === 'running') {
      changed += await em.nativeUpdate(ScoringRunSchema, where, { stability: { ...r.stability, status: 'failed', error: { ...SCORING_ORPHANED }, finishedAt: new Date().toISOString() }, claimedBy: null });
    } else {
      changed += await em.nativeUpdate(ScoringRunSchema, where, { claimedBy: null });
    }
    em.getUnitOfWork().unsetIdentity(r);
  }
  return changed;
}

/**
 * Marks a run's running stability check failed (the run's results stay).
 * @param em entity manager
 * @param runId the run
 * @param claimedBy the runner that owns the check
 * @param code error code
 * @param message what happened and what to do
 * @returns nothing
 * @example
 * await scoringStabilityFail(em, id, runner.id, 'CUSTOMER_FILE_DELETED', '…');
 */
export async function scoringStabilityFail(em: EntityManager, runId: string, claimedBy: string, code: string, message: string): Promise<void> {
  const row = await em.findOne(ScoringRunSchema, { id: runId, claimedBy }, { refresh: true });
  if (!row?.stability || row.stability.status !== 'running') return;
  await em.nativeUpdate(ScoringRunSchema, { id: runId, claimedBy }, { stability: { ...row.stability, status: 'failed', error: { code, message }, finishedAt: new Date().toISOString() }, claimedBy: null });
}

/** A claimed row whose heartbeat is older than this (ms) belongs to a stopped process. */
export const SCORING_STALE_MS = 30_000;

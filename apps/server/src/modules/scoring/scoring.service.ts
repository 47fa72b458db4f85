import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { ScoringRunner } from '../../jobs/scoring-runner.js';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../common/errors.js';
import { CustomerFileSchema } from '../customer-file/customer-file.entity.js';
import { SiteSchema } from '../site/site.entity.js';
import { SurfaceSchema } from '../surface/surface.entity.js';
import type { User } from '../user/user.entity.js';
import { scoringInputLoad, scoringRunSurface } from './scoring-input.js';
import { ScoringRunSchema, type ScoringRun } from './scoring-run.entity.js';
import { scoringRecoverStale, scoringRunLoad, scoringRunsOfWorkspace, SCORING_STALE_MS } from './scoring-run.repository.js';
import { scoringRunJson, scoringRunSummaryJson } from './scoring-run-view.js';
import { scoringScopeCheck, type ScoringScope } from './scoring-scope.js';
import { demandUnitWords } from './scoring-demand-unit.js';
import { scoringSettingsGet } from './scoring-settings.service.js';
import { ringRadiiMetres } from './scoring.schemas.js';
import { STABILITY_FACTORS } from './scoring-stability.js';
import type { RunSiteJson, ScoringRunJson, ScoringRunSummaryJson, SiteSetJson } from './scoring.types.js';


export type { ScoringScope } from './scoring-scope.js';

async function recoverStale(em: EntityManager): Promise<void> {
  await scoringRecoverStale(em, Date.now() - SCORING_STALE_MS);
}

/**
 * One run with its results, stability and sets (for routes, exports and shortlists).
 * @param em entity manager
 * @param scope organization and workspace
 * @param runId the run
 * @returns the run JSON
 * @throws NotFoundError 404 for unknown ids and other organizations' runs
 * @example
 * const run = await scoringRunGet(em, { organizationId, workspaceId }, runId);
 */
export async function scoringRunGet(em: EntityManager, scope: ScoringScope, runId: string): Promise<ScoringRunJson> {
  await scoringScopeCheck(em, scope);
  await recoverStale(em);
  return scoringRunJson(await scoringRunLoad(em, scope, runId));
}

/**
 * Runs of a workspace, newest first, without results.
 * @param em entity manager
 * @param scope organization and workspace
 * @returns summaries
 * @example
 * const runs = await scoringRunList(em, scope);
 */
export async function scoringRunList(em: EntityManager, scope: ScoringScope): Promise<ScoringRunSummaryJson[]> {
  await scoringScopeCheck(em, scope);
  await recoverStale(em);
  return (await scoringRunsOfWorkspace(em, scope)).map(scoringRunSummaryJson);
}

/**
 * Queues a scoring run on a succeeded surface with the workspace's saved settings and a snapshot
 * of its sites, records `scoring.run_create`, and hands it to the runner (a worker thread).
 * Scoring spends no credits.
 * @param em entity manager
 * @param scope organization and workspace
 * @param actor who starts it
 * @param input surface id and optional name
 * @param runner the scoring runner
 * @returns the queued run
 * @throws NotFoundError unknown surface; ConflictError SURFACE_NOT_READY; AppError 400 NO_CANDIDATES
 * @example
 * const run = await scoringRunCreate(em, scope, user, { surfaceId }, runner);
 */
export async function scoringRunCreate(em: EntityManager, scope: ScoringScope, actor: User, input: { surfaceId: string; name?: string }, runner: ScoringRunner): Promise<ScoringRunJson> {
  await scoringScopeCheck(em, scope);
  const surface = await em.findOne(SurfaceSchema, { id: input.surfaceId, organization: scope.organizationId, workspace: scope.workspaceId });
  if (!surface) throw new NotFoundError('Surface');
  if (surface.status !== 'succeeded' || !surface.resolved) {
    throw new ConflictError('SURFACE_NOT_READY', `The surface "${surface.name}" is ${surface.status}; scoring needs a surface that has succeeded.`, 'surfaceId');
  }
  const siteRows = await em.find(SiteSchema, { organization: scope.organizationId, workspace: scope.workspaceId }, { orderBy: { kind: 'asc', name: 'asc', id: 'asc' } });
  const sites: RunSiteJson[] = siteRows.map((s) => ({
    siteId: s.id,
    name: s.name,
    kind: s.kind,
    lon: s.lon,
    lat: s.lat,
    attractiveness: s.attractiveness,
    attractivenessLabel: s.attractivenessLabel,
    notes: s.notes,
  }));
  const candidateCount = sites.filter((s) => s.kind === 'candidate').length;
  if (candidateCount === 0) {
    throw new AppError(400, 'NO_CANDIDATES', 'This workspace has no candidate sites; add at least one candidate (map, form or import) before scoring.');
  }
  const settings = await scoringSettingsGet(em, scope);
  const file = surface.customerFileId ? await em.findOne(CustomerFileSchema, { id: surface.customerFileId }) : null;
  const now = new Date();
  const run = em.create(ScoringRunSchema, {
    id: entityId(),
    organization: em.getReference('Organization', scope.organizationId),
    workspace: em.getReference('Workspace', scope.workspaceId),
    surfaceId: surface.id,
    surfaceName: surface.name,
    name: input.name ?? `${surface.name} — ${now.toISOString().slice(0, 16).replace('T', ' ')} UTC`,
    status: 'queued',
    progress: 0,
    settings: { ...settings, radiiM: ringRadiiMetres(settings.radii, settings.radiusUnit) },
    sites,
    surfaceInfo: {
      bandwidthM: surface.resolved.bandwidth.value,
      kernel: surface.params.kernel,
      cellSizeM: surface.resolved.grid.cellSize,
      projection: surface.resolved.projection.label,
    },
    weightLabel: demandUnitWords(file),
    candidateCount,
    results: null,
    stability: null,
    sets: [],
    warnings: [],
    error: null,
    timings: null,
    claimedBy: runner.id,
    heartbeatAt: now,
    startedAt: null,
    finishedAt: null,
    createdBy: em.getReference('User', actor.id),
  } as unknown as ScoringRun);
  auditRecord(em, {
    action: 'scoring.run_create',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'scoring_run', id: run.id },
    details: { workspaceId: scope.workspaceId, surfaceId: surface.id, candidateCount, sites: sites.length },
  });
  await em.flush();
  runner.scoreEnqueue(run.id);
  return scoringRunGet(em, scope, run.id);
}

/**
 * Deletes a run (stopping its worker first) and records `scoring.run_delete`.
 * @param em entity manager
 * @param scope organization and workspace
 * @param runId the run
 * @param actor who deletes it
 * @param runner the scoring runner
 * @returns nothing
 * @example
 * await scoringRunDelete(em, scope, id, user, runner);
 */
export async function scoringRunDelete(em: EntityManager, scope: ScoringScope, runId: string, actor: User, runner: ScoringRunner): Promise<void> {
  await scoringScopeCheck(em, scope);
  const run = await scoringRunLoad(em, scope, runId);
  await runner.cancel(run.id);
  auditRecord(em, { action: 'scoring.run_delete', organizationId: scope.organizationId, actor, target: { type: 'scoring_run', id: run.id }, details: { workspaceId: scope.workspaceId, name: run.name } });
  em.remove(run);
  await em.flush();
}

function succeededOrConflict(run: ScoringRun): void {
  if (run.status !== 'succeeded' || !run.results) {
    throw new ConflictError('RUN_NOT_READY', `This scoring run is ${run.status}; wait until it has succeeded.`);
  }
}

/**
 * Starts the rank-stability check of a succeeded run in a worker thread (stability.status =
 * 'running'; poll the run). Answers at once with the run when a check is already running.
 * @param em entity manager
 * @param scope organization and workspace
 * @param runId the run
 * @param runner the scoring runner
 * @returns the run with stability.status 'running'
 * @throws ConflictError RUN_NOT_READY, SURFACE_DELETED, CUSTOMER_FILE_DELETED; AppError 400 TOO_FEW_CANDIDATES
 * @example
 * const run = await scoringStabilityStart(em, scope, id, runner);
 */
export async function scoringStabilityStart(em: EntityManager, scope: ScoringScope, runId: string, runner: ScoringRunner): Promise<ScoringRunJson> {
  await scoringScopeCheck(em, scope);
  await recoverStale(em);
  const run = await scoringRunLoad(em, scope, runId);
  succeededOrConflict(run);
  if (run.stability?.status === 'running') return scoringRunJson(run);
  if (run.candidateCount < 2) {
    throw new AppError(400, 'TOO_FEW_CANDIDATES', `Rank stability compares rankings, so it needs at least 2 candidates; this run has ${run.candidateCount}.`);
  }
  const surface = await scoringRunSurface(em, run);
  if (!surface.customerFileId || (await em.count(CustomerFileSchema, { id: surface.customerFileId })) === 0) {
    throw new ConflictError(
      'CUSTOMER_FILE_DELETED',
      `The customer file behind the surface "${surface.name}" was deleted, so surfaces at other bandwidths cannot be rebuilt; rank stability needs a surface whose customer file still exists.`,
    );
  }
  const stability = { status: 'running' as const, error: null, factors: [...STABILITY_FACTORS], threshold: 0, variants: [], sites: [], finishedAt: null };
  const changed = await em.nativeUpdate(ScoringRunSchema, { id: run.id, claimedBy: null }, { stability, claimedBy: runner.id, heartbeatAt: new Date() });
  if (changed === 0) throw new ConflictError('RUN_BUSY', 'This run is busy with another computation; try again in a moment.');
  runner.stabilityEnqueue(run.id);
  return scoringRunGet(em, scope, run.id);
}

/**
 * Scores a set of the run's candidates opened together (worker thread), stores it in `run.sets`
 * and records `scoring.set_create`.
 * @param em entity manager
 * @param scope organization and workspace
 * @param runId the run
 * @param actor who asks
 * @param input 2–20 candidate ids of the run and an optional name
 * @param runner the scoring runner
 * @returns the stored set
 * @throws ValidationError for ids that are not candidates of the run or repeat; ConflictError RUN_NOT_READY / SURFACE_DELETED
 * @example
 * const set = await scoringSetCreate(em, scope, id, user, { siteIds: ['c1', 'c2'] }, runner);
 */
export async function scoringSetCreate(
  em: EntityManager,
  scope: ScoringScope,
  runId: string,
  actor: User,
  input: { siteIds: string[]; name?: string },
  runner: ScoringRunner,
): Promise<SiteSetJson> {
  await scoringScopeCheck(em, scope);
  const run = await scoringRunLoad(em, scope, runId);
  succeededOrConflict(run);
  const candidates = new Map(run.sites.filter((s) => s.kind === 'candidate').map((s) => [s.siteId, s]));
  input.siteIds.forEach((id, k) => {
    if (!candidates.has(id)) throw new ValidationError(`siteIds.${k}: "${id}" is not a candidate of this run; choose candidates from the run's ranking`, `siteIds.${k}`);
    if (input.siteIds.indexOf(id) !== k) throw new ValidationError(`siteIds.${k}: "${candidates.get(id)!.name}" is listed twice; name each candidate once`, `siteIds.${k}`);
  });
  const parts = await runner.setScore(await scoringInputLoad(em, run), input.siteIds);
  const set: SiteSetJson = {
    id: randomUUID(),
    name: input.name ?? input.siteIds.map((id) => candidates.get(id)!.name).join(' + ').slice(0, 120),
    ...parts,
    createdAt: new Date().toISOString(),
    createdBy: { id: actor.id, name: actor.name },
  };
  await em.transactional(async (tx) => {
    const fresh = await tx.findOneOrFail(ScoringRunSchema, run.id, { refresh: true });
    fresh.sets = [...fresh.sets, set];
    auditRecord(tx, { action: 'scoring.set_create', organizationId: scope.organizationId, actor, target: { type: 'scoring_run', id: run.id }, details: { workspaceId: scope.workspaceId, setId: set.id, siteIds: set.siteIds } });
  });
  return set;
}

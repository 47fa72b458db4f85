import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { ConflictError, NotFoundError } from '../common/errors.js';
import { CustomerFileSchema } from '../customer-file/customer-file.entity.js';
import { customerPointsLoad } from '../customer-file/customer-points.js';
import type { User } from '../user/user.entity.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';
import { surfaceCreditsRelease, surfaceCreditsReserve } from './surface-credits.js';
import { surfacePlanOffThread } from './surface-plan-off-thread.js';
import { SurfaceSchema, type Surface } from './surface.entity.js';
import type { SurfaceCreateInput, SurfaceParams } from './surface.schemas.js';

const requireHere = createRequire(import.meta.url);
/** Version of the density engine (packages/core), stored with every run. */
export const ENGINE_VERSION = (requireHere(join(dirname(requireHere.resolve('@demandscape/core')), '..', 'package.json')) as { version: string }).version;

/** A run as the API returns it (no raster). */
export interface SurfaceView {
  id: string;
  name: string;
  status: Surface['status'];
  progress: number;
  customerFileId: string | null;
  params: SurfaceParams;
  resolved: Surface['resolved'];
  engineVersion: string;
  attempts: number;
  pointCount: number;
  costCredits: number;
  queuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  timings: Surface['timings'];
  error: Surface['error'];
  stats: Surface['stats'];
  thresholds: Surface['thresholds'];
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
}

/**
 * The API shape of a run.
 * @param s the run (createdBy loaded or a reference)
 * @returns the view
 * @example
 * res.json({ surface: surfaceView(s) });
 */
export function surfaceView(s: Surface): SurfaceView {
  return {
    id: s.id,
    name: s.name,
    status: s.status,
    progress: s.progress,
    customerFileId: s.customerFileId,
    params: s.params,
    resolved: s.resolved,
    engineVersion: s.engineVersion,
    attempts: s.attempts,
    pointCount: s.pointCount,
    costCredits: s.costCredits,
    queuedAt: s.queuedAt.toISOString(),
    startedAt: s.startedAt?.toISOString() ?? null,
    finishedAt: s.finishedAt?.toISOString() ?? null,
    timings: s.timings,
    error: s.error,
    stats: s.stats,
    thresholds: s.thresholds,
    createdBy: s.createdBy ? { id: s.createdBy.id, name: s.createdBy.name } : null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

/** Where a request points: organization and workspace (checked to belong together). */
export interface SurfaceScope {
  organizationId: string;
  workspaceId: string;
}

/**
 * 404 unless the workspace belongs to the organization.
 * @param em entity manager
 * @param scope organization and workspace ids
 * @returns nothing
 * @example
 * await surfaceScopeCheck(em, { organizationId, workspaceId });
 */
export async function surfaceScopeCheck(em: EntityManager, scope: SurfaceScope): Promise<void> {
  const w = await em.findOne(WorkspaceSchema, { id: scope.workspaceId, organization: scope.organizationId }, { fields: ['id'] });
  if (!w) throw new NotFoundError('Workspace');
}

/**
 * One run of the workspace, or 404.
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @returns the run
 * @example
 * const s = await surfaceLoad(em, scope, id);
 */
export async function surfaceLoad(em: EntityManager, scope: SurfaceScope, surfaceId: string): Promise<Surface> {
  const s = await em.findOne(SurfaceSchema, { id: surfaceId, organization: scope.organizationId, workspace: scope.workspaceId }, { populate: ['createdBy'] });
  if (!s) throw new NotFoundError('Surface');
  return s;
}

async function planForInput(em: EntityManager, scope: SurfaceScope, input: SurfaceCreateInput) {
  const file = await em.findOne(CustomerFileSchema, { id: input.customerFileId, organization: scope.organizationId, workspace: scope.workspaceId });
  if (!file) throw new NotFoundError('Customer file');
  if (file.status !== 'imported') {
    throw new ConflictError('FILE_NOT_IMPORTED', `The customer file "${file.name}" is ${file.status}; finish its import before computing a surface.`, 'customerFileId');
  }
  const points = await customerPointsLoad(em, file.id);
  const { customerFileId: _id, name: _name, ...params } = input;
  const count = points.count;
  const plan = await surfacePlanOffThread(points, params);
  return { file, plan, params, count };
}

/**
 * The form's live estimate: bandwidth (value, rule, explanation, Gaussian sd, radius), cell size,
 * grid, credit cost, warnings and projection, without queueing anything.
 * @param em entity manager
 * @param scope organization and workspace
 * @param input the create body
 * @returns the estimate (contract shape)
 * @throws SurfaceInputError 400 with the engine's message (e.g. GRID_TOO_LARGE + details.suggestedCellSize)
 * @example
 * const e = await surfaceEstimate(em, scope, { customerFileId, kernel: 'quartic', … });
 */
export async function surfaceEstimate(em: EntityManager, scope: SurfaceScope, input: SurfaceCreateInput) {
  await surfaceScopeCheck(em, scope);
  const { plan } = await planForInput(em, scope, input);
  const b = plan.bandwidth;
  return {
    bandwidth: { value: b.value, rule: b.rule, explanation: b.explanation, gaussianSd: b.gaussianSd, radius: b.radius },
    cellSize: plan.cellSize,
    grid: { width: plan.grid.width, height: plan.grid.height, cells: plan.grid.width * plan.grid.height },
    cost: plan.cost,
    method: plan.method,
    estimatedSeconds: Number(plan.estimatedSeconds.toFixed(1)),
    warnings: plan.warnings,
    projection: { epsg: plan.projection.epsg, label: plan.projection.label },
  };
}

/**
 * Queues a run: checks the file and the parameters with the engine (400 on bad input), stores the
 * params, point count and credit cost, reserves credits and records `surface.create`.
 * @param em entity manager
 * @param scope organization and workspace
 * @param actor the creator (e-mailed when it ends)
 * @param input the create body
 * @returns the queued run
 * @example
 * const s = await surfaceCreate(em, scope, user, { customerFileId, kernel: 'quartic', … });
 */
export async function surfaceCreate(em: EntityManager, scope: SurfaceScope, actor: User, input: SurfaceCreateInput): Promise<SurfaceView> {
  await surfaceScopeCheck(em, scope);
  const { file, plan, params, count } = await planForInput(em, scope, input);
  const now = new Date();
  const name = input.name ?? `${file.name} · ${params.kernel} ${Math.round(plan.bandwidth.value)} m`;
  const s = em.create(SurfaceSchema, {
    id: entityId(),
    organization: em.getReference('Organization', scope.organizationId),
    workspace: em.getReference('Workspace', scope.workspaceId),
    customerFileId: file.id,
    name: name.slice(0, 120),
    status: 'queued',
    progress: 0,
    params,
    resolved: null,
    engineVersion: ENGINE_VERSION,
    attempts: 0,
    claimedBy: null,
    heartbeatAt: null,
    queuedAt: now,
    startedAt: null,
    finishedAt: null,
    timings: null,
    error: null,
    stats: null,
    thresholds: null,
    pointCount: count,
    costCredits: plan.cost.credits,
    creditRef: null,
    createdBy: em.getReference('User', actor.id),
  } as unknown as Surface, { persist: false });
  // The run row and its credit reservation are written in one transaction.
  await em.transactional(async (tem) => {
    tem.persist(s);
    await surfaceCreditsReserve(tem, s);
    auditRecord(tem, {
      action: 'surface.create',
      organizationId: scope.organizationId,
      actor,
      target: { type: 'surface', id: s.id },
      details: { customerFileId: file.id, credits: plan.cost.credits, cells: plan.grid.width * plan.grid.height },
    });
  });
  return surfaceView(await surfaceLoad(em, scope, s.id));
}

/**
 * Runs of a workspace, newest first (no rasters).
 * @param em entity manager
 * @param scope organization and workspace
 * @returns views
 * @example
 * const list = await surfaceList(em, scope);
 */
export async function surfaceList(em: EntityManager, scope: SurfaceScope): Promise<SurfaceView[]> {
  await surfaceScopeCheck(em, scope);
  const rows = await em.find(SurfaceSchema, { organization: scope.organizationId, workspace: scope.workspaceId }, { populate: ['createdBy'], orderBy: { queuedAt: 'desc', id: 'asc' } });
  return rows.map(surfaceView);
}

/**
 * Cancels a queued or running run (the runner stops its worker and writes nothing more).
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @param actor who cancels
 * @returns the cancelled run
 * @throws ConflictError NOT_CANCELLABLE once the run has ended
 * @example
 * await surfaceCancel(em, scope, id, user);
 */
export async function surfaceCancel(em: EntityManager, scope: SurfaceScope, surfaceId: string, actor: User): Promise<SurfaceView> {
  const s = await surfaceLoad(em, scope, surfaceId);
  if (s.status !== 'queued' && s.status !== 'running') {
    throw new ConflictError('NOT_CANCELLABLE', `This surface has already ${s.status === 'cancelled' ? 'been cancelled' : s.status}; only queued or running surfaces can be cancelled.`);
  }
  const was = s.status;
  s.status = 'cancelled';
  s.finishedAt = new Date();
  s.claimedBy = null;
  await em.transactional(async (tem) => {
    await surfaceCreditsRelease(tem, s);
    auditRecord(tem, { action: 'surface.cancel', organizationId: scope.organizationId, actor, target: { type: 'surface', id: s.id }, details: { was } });
  });
  return surfaceView(s);
}

/**
 * Queues a failed or cancelled run again with the same inputs (attempts start over).
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @param actor who retries
 * @returns the queued run
 * @throws ConflictError NOT_RETRYABLE unless failed or cancelled; FILE_DELETED without its file
 * @example
 * await surfaceRetry(em, scope, id, user);
 */
export async function surfaceRetry(em: EntityManager, scope: SurfaceScope, surfaceId: string, actor: User): Promise<SurfaceView> {
  const s = await surfaceLoad(em, scope, surfaceId);
  if (s.status !== 'failed' && s.status !== 'cancelled') {
    throw new ConflictError('NOT_RETRYABLE', `This surface is ${s.status}; only failed or cancelled surfaces can be retried.`);
  }
  if (!s.customerFileId) throw new ConflictError('FILE_DELETED', 'The customer file of this surface was deleted; create a new surface from another file.');
  Object.assign(s, { status: 'queued', progress: 0, attempts: 0, error: null, claimedBy: null, heartbeatAt: null, startedAt: null, finishedAt: null, queuedAt: new Date() });
  await em.transactional(async (tem) => {
    await surfaceCreditsReserve(tem, s);
    auditRecord(tem, { action: 'surface.retry', organizationId: scope.organizationId, actor, target: { type: 'surface', id: s.id } });
  });
  return surfaceView(s);
}

/**
 * Deletes a run and its results (a running worker is stopped by its runner).
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @param actor who deletes
 * @returns nothing
 * @example
 * await surfaceDelete(em, scope, id, user);
 */
export async function surfaceDelete(em: EntityManager, scope: SurfaceScope, surfaceId: string, actor: User): Promise<void> {
  const s = await surfaceLoad(em, scope, surfaceId);
  await em.transactional(async (tem) => {
    if (s.status === 'queued' || s.status === 'running') await surfaceCreditsRelease(tem, s);
    auditRecord(tem, { action: 'surface.delete', organizationId: scope.organizationId, actor, target: { type: 'surface', id: s.id }, details: { name: s.name, status: s.status } });
    tem.remove(s);
  });
}

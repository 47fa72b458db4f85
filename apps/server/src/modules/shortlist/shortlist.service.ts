import { UniqueConstraintViolationException } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors.js';
import { scoringRunGet } from '../scoring/scoring.service.js';
import type { ScoringRunJson } from '../scoring/scoring.types.js';
import type { User } from '../user/user.entity.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';
import { shortlistSnapshot } from './shortlist-snapshot.js';
import { shortlistJson, shortlistSummaryJson } from './shortlist-view.js';
import {
  ShortlistSchema,
  ShortlistVersionSchema,
  type Shortlist,
  type ShortlistVersion,
} from './shortlist.entity.js';
import type { ShortlistCreateInput, ShortlistVersionInput } from './shortlist.schemas.js';
import type { ShortlistJson, ShortlistSummaryJson } from './shortlist.types.js';

/** Which workspace of which organization a request works in. */
export interface ShortlistScope {
  organizationId: string;
  workspaceId: string;
}

async function workspaceCheck(em: EntityManager, scope: ShortlistScope): Promise<void> {
  const count = await em.count(WorkspaceSchema, {
    id: scope.workspaceId,
    organization: scope.organizationId,
  });
  if (count === 0) throw new NotFoundError('Workspace');
}

/**
 * A shortlist of the workspace (404 for unknown ids, other workspaces and other organizations).
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @returns the entity with workspace and createdBy loaded
 * @example
 * const s = await shortlistLoad(em, scope, id);
 */
export async function shortlistLoad(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
): Promise<Shortlist> {
  await workspaceCheck(em, scope);
  const s = await em.findOne(
    ShortlistSchema,
    { id: shortlistId, organization: scope.organizationId, workspace: scope.workspaceId },
    { populate: ['workspace', 'createdBy'] },
  );
  if (!s) throw new NotFoundError('Shortlist');
  return s;
}

async function runForShortlist(
  em: EntityManager,
  scope: ShortlistScope,
  runId: string,
): Promise<ScoringRunJson> {
  try {
    return await scoringRunGet(em, scope, runId);
  } catch (err) {
    if (err instanceof NotFoundError)
      throw new ValidationError(
        'scoringRunId: no scoring run with this id in this workspace; choose one of its runs',
        'scoringRunId',
      );
    throw err;
  }
}

function versionAdd(
  em: EntityManager,
  s: Shortlist,
  version: number,
  run: ScoringRunJson,
  input: ShortlistVersionInput,
  actor: User,
): ShortlistVersion {
  const snapshot = shortlistSnapshot(run, input.items);
  return em.create(ShortlistVersionSchema, {
    id: entityId(),
    shortlist: s,
    version,
    versionNote: input.versionNote ?? '',
    scoringRunId: run.id,
    snapshot,
    itemCount: snapshot.items.length,
    createdBy: em.getReference('User', actor.id),
  } as ShortlistVersion);
}

/**
 * Shortlists of one workspace, or of the whole organization when `workspaceId` is null (the
 * executive's list), most recently changed first.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param workspaceId - one workspace (checked to belong to the organization), or null for all
 * @returns summaries
 * @example
 * const all = await shortlistList(em, orgId, null);
 */
export async function shortlistList(
  em: EntityManager,
  organizationId: string,
  workspaceId: string | null,
): Promise<ShortlistSummaryJson[]> {
  if (workspaceId !== null) await workspaceCheck(em, { organizationId, workspaceId });
  const rows = await em.find(
    ShortlistSchema,
    { organization: organizationId, ...(workspaceId !== null ? { workspace: workspaceId } : {}) },
    { populate: ['workspace', 'createdBy'], orderBy: { updatedAt: 'desc', id: 'asc' } },
  );
  return rows.map(shortlistSummaryJson);
}

/**
 * A shortlist with one version (the latest unless `version` is given).
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @param version - version number, or undefined for the latest
 * @returns the shortlist JSON
 * @throws NotFoundError for an unknown shortlist or version
 * @example
 * const { version } = await shortlistGet(em, scope, id, 1);
 */
export async function shortlistGet(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
  version?: number,
): Promise<ShortlistJson> {
  const s = await shortlistLoad(em, scope, shortlistId);
  const versions = await em.find(
    ShortlistVersionSchema,
    { shortlist: s.id },
    { populate: ['createdBy'], orderBy: { version: 'asc' } },
  );
  const wanted = version ?? s.latestVersion;
  const shown = versions.find((v) => v.version === wanted);
  if (!shown)
    throw new NotFoundError(
      `Shortlist version ${wanted} (this shortlist has versions 1–${s.latestVersion})`,
    );
  return shortlistJson(s, versions, shown);
}

/**
 * Creates a shortlist with version 1 from a succeeded run and records `shortlist.create`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param actor - the planner or owner
 * @param input - name, run, ordered items with notes, version note
 * @returns the shortlist JSON (version 1)
 * @example
 * await shortlistCreate(em, scope, user, { name: 'Board pick', scoringRunId, items: [{ siteId }] });
 */
export async function shortlistCreate(
  em: EntityManager,
  scope: ShortlistScope,
  actor: User,
  input: ShortlistCreateInput,
): Promise<ShortlistJson> {
  await workspaceCheck(em, scope);
  const run = await runForShortlist(em, scope, input.scoringRunId);
  const now = new Date();
  const s = em.create(ShortlistSchema, {
    id: entityId(),
    createdAt: now,
    updatedAt: now,
    organization: em.getReference('Organization', scope.organizationId),
    workspace: em.getReference('Workspace', scope.workspaceId),
    name: input.name,
    latestVersion: 1,
    itemCount: input.items.length,
    sharedAt: null,
    sharedWith: [],
    createdBy: em.getReference('User', actor.id),
  } as Shortlist);
  versionAdd(em, s, 1, run, input, actor);
  auditRecord(em, {
    action: 'shortlist.create',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'shortlist', id: s.id },
    details: {
      workspaceId: scope.workspaceId,
      name: s.name,
      scoringRunId: run.id,
      itemCount: input.items.length,
    },
  });
  await em.flush();
  return shortlistGet(em, scope, s.id);
}

/**
 * Saves a new latest version (any succeeded run of the workspace) and records `shortlist.version_create`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @param actor - the planner or owner
 * @param input - run, ordered items with notes, version note
 * @returns the shortlist JSON with the new version
 * @throws ConflictError 409 VERSION_CONFLICT when another request saved the same version number first
 * @example
 * await shortlistVersionCreate(em, scope, id, user, { scoringRunId, items, versionNote: 'Mill Lane first' });
 */
export async function shortlistVersionCreate(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
  actor: User,
  input: ShortlistVersionInput,
): Promise<ShortlistJson> {
  const s = await shortlistLoad(em, scope, shortlistId);
  const run = await runForShortlist(em, scope, input.scoringRunId);
  const version = s.latestVersion + 1;
  versionAdd(em, s, version, run, input, actor);
  s.latestVersion = version;
  s.itemCount = input.items.length;
  auditRecord(em, {
    action: 'shortlist.version_create',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'shortlist', id: s.id },
    details: {
      workspaceId: scope.workspaceId,
      version,
      scoringRunId: run.id,
      itemCount: input.items.length,
    },
  });
  try {
    await em.flush();
  } catch (err) {
    if (!(err instanceof UniqueConstraintViolationException)) throw err;
    throw new ConflictError(
      'VERSION_CONFLICT',
      `Another version ${version} of this shortlist was saved at the same moment; reload the shortlist and save again.`,
    );
  }
  return shortlistGet(em, scope, s.id);
}

/**
 * Renames a shortlist and records `shortlist.rename`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @param actor - the planner or owner
 * @param name - the new name
 * @returns the shortlist JSON (latest version)
 * @example
 * await shortlistRename(em, scope, id, user, 'Board pick, March');
 */
export async function shortlistRename(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
  actor: User,
  name: string,
): Promise<ShortlistJson> {
  const s = await shortlistLoad(em, scope, shortlistId);
  auditRecord(em, {
    action: 'shortlist.rename',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'shortlist', id: s.id },
    details: { workspaceId: scope.workspaceId, from: s.name, to: name },
  });
  s.name = name;
  await em.flush();
  return shortlistGet(em, scope, s.id);
}

/**
 * Deletes a shortlist with all its versions and records `shortlist.delete`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @param actor - the planner or owner
 * @returns nothing
 * @example
 * await shortlistDelete(em, scope, id, user);
 */
export async function shortlistDelete(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
  actor: User,
): Promise<void> {
  const s = await shortlistLoad(em, scope, shortlistId);
  auditRecord(em, {
    action: 'shortlist.delete',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'shortlist', id: s.id },
    details: { workspaceId: scope.workspaceId, name: s.name, versions: s.latestVersion },
  });
  await em.nativeDelete(ShortlistVersionSchema, { shortlist: s.id });
  em.remove(s);
  await em.flush();
}

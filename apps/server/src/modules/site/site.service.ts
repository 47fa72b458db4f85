import type { EntityManager } from '@mikro-orm/sqlite';
import type { SiteKind } from '@demandscape/core';
import { SiteSchema, type Site } from './site.entity.js';
import type { SiteCreateInput, SiteUpdateInput } from './site.schemas.js';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { NotFoundError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';

/** Which workspace of which organization a request works in. */
export interface SiteScope {
  organizationId: string;
  workspaceId: string;
}

/** A site as the API returns it. */
export interface SiteView {
  id: string;
  workspaceId: string;
  kind: SiteKind;
  name: string;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel: string;
  notes: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
}

/**
 * The API shape of a site.
 * @param s - the entity (createdBy populated or null)
 * @returns the view
 * @example
 * res.json({ site: siteView(site) });
 */
export function siteView(s: Site): SiteView {
  return {
    id: s.id,
    workspaceId: s.workspace.id,
    kind: s.kind,
    name: s.name,
    lon: s.lon,
    lat: s.lat,
    attractiveness: s.attractiveness,
    attractivenessLabel: s.attractivenessLabel,
    notes: s.notes,
    createdBy: s.createdBy ? { id: s.createdBy.id, name: s.createdBy.name } : null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

/**
 * 404 unless the workspace belongs to the organization (another organization's ids are "not found").
 * @param em - entity manager
 * @param scope - organization and workspace
 * @returns nothing
 * @example
 * await siteWorkspaceCheck(em, { organizationId, workspaceId });
 */
export async function siteWorkspaceCheck(em: EntityManager, scope: SiteScope): Promise<void> {
  const count = await em.count(WorkspaceSchema, { id: scope.workspaceId, organization: scope.organizationId });
  if (count === 0) throw new NotFoundError('Workspace');
}

async function siteLoad(em: EntityManager, scope: SiteScope, siteId: string): Promise<Site> {
  const s = await em.findOne(SiteSchema, { id: siteId, organization: scope.organizationId, workspace: scope.workspaceId }, { populate: ['createdBy'] });
  if (!s) throw new NotFoundError('Site');
  return s;
}

/**
 * Sites of a workspace, optionally of one kind, by kind then name.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param kind - only this kind when given
 * @returns site views
 * @example
 * const candidates = await siteList(em, scope, 'candidate');
 */
export async function siteList(em: EntityManager, scope: SiteScope, kind?: SiteKind): Promise<SiteView[]> {
  await siteWorkspaceCheck(em, scope);
  const rows = await em.find(
    SiteSchema,
    { organization: scope.organizationId, workspace: scope.workspaceId, ...(kind ? { kind } : {}) },
    { populate: ['createdBy'], orderBy: { kind: 'asc', name: 'asc', id: 'asc' } },
  );
  return rows.map(siteView);
}

/**
 * Queues a new site in the unit of work (no flush), so imports can add many in one transaction.
 * @param em - entity manager
 * @param scope - organization and workspace (checked by the caller)
 * @param actor - creator
 * @param input - validated fields
 * @returns the new entity
 * @example
 * siteAdd(em, scope, user, { kind: 'own', name: 'Harbour Row', lon: -38.5, lat: 44.5, attractiveness: 180 });
 */
export function siteAdd(em: EntityManager, scope: SiteScope, actor: User, input: SiteCreateInput): Site {
  return em.create(SiteSchema, {
    id: entityId(),
    organization: em.getReference('Organization', scope.organizationId),
    workspace: em.getReference('Workspace', scope.workspaceId),
    kind: input.kind,
    name: input.name,
    lon: input.lon,
    lat: input.lat,
    attractiveness: input.attractiveness,
    attractivenessLabel: input.attractivenessLabel ?? '',
    notes: input.notes ?? '',
    createdBy: em.getReference('User', actor.id),
  } as Site);
}

/**
 * Inserts many validated sites in one statement batch, without the unit of work (an import of
 * 5,000 sites would otherwise track 5,000 entities). Call inside a transaction with the audit event.
 * @param em - entity manager (a transaction's)
 * @param scope - organization and workspace (checked by the caller)
 * @param actor - creator
 * @param inputs - validated fields
 * @returns nothing
 * @example
 * await em.transactional((tx) => siteInsertMany(tx, scope, user, sites));
 */
export async function siteInsertMany(em: EntityManager, scope: SiteScope, actor: User, inputs: SiteCreateInput[]): Promise<void> {
  const now = new Date();
  const rows = inputs.map((input) => ({
    id: entityId(),
    organization: scope.organizationId,
    workspace: scope.workspaceId,
    kind: input.kind,
    name: input.name,
    lon: input.lon,
    lat: input.lat,
    attractiveness: input.attractiveness,
    attractivenessLabel: input.attractivenessLabel ?? '',
    notes: input.notes ?? '',
    createdBy: actor.id,
    createdAt: now,
    updatedAt: now,
  }));
  // SQLite allows 32,766 bound values per statement; 13 columns × 1,000 rows stays well below.
  for (let i = 0; i < rows.length; i += 1000) await em.insertMany(SiteSchema, rows.slice(i, i + 1000) as unknown as Site[]);
}

/**
 * Creates a site and records `site.create`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param actor - creator
 * @param input - validated fields
 * @returns the view
 * @example
 * await siteCreate(em, scope, user, { kind: 'candidate', name: 'Quay corner', lon: -38.51, lat: 44.52, attractiveness: 120 });
 */
export async function siteCreate(em: EntityManager, scope: SiteScope, actor: User, input: SiteCreateInput): Promise<SiteView> {
  await siteWorkspaceCheck(em, scope);
  const s = siteAdd(em, scope, actor, input);
  auditRecord(em, { action: 'site.create', organizationId: scope.organizationId, actor, target: { type: 'site', id: s.id }, details: { workspaceId: scope.workspaceId, kind: s.kind, name: s.name } });
  await em.flush();
  return siteView(await siteLoad(em, scope, s.id));
}

/**
 * Edits or moves a site (a move sends new `lon` and `lat`) and records `site.update`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param siteId - the site
 * @param actor - who changes it
 * @param input - fields to change
 * @returns the view
 * @example
 * await siteUpdate(em, scope, id, user, { lon: -38.49, lat: 44.53 });
 */
export async function siteUpdate(em: EntityManager, scope: SiteScope, siteId: string, actor: User, input: SiteUpdateInput): Promise<SiteView> {
  const s = await siteLoad(em, scope, siteId);
  const fields = Object.keys(input).filter((k) => input[k as keyof SiteUpdateInput] !== undefined);
  Object.assign(s, Object.fromEntries(fields.map((k) => [k, input[k as keyof SiteUpdateInput]])));
  auditRecord(em, { action: 'site.update', organizationId: scope.organizationId, actor, target: { type: 'site', id: s.id }, details: { workspaceId: scope.workspaceId, fields } });
  await em.flush();
  return siteView(s);
}

/**
 * Deletes a site and records `site.delete`.
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param siteId - the site
 * @param actor - who deletes it
 * @returns nothing
 * @example
 * await siteDelete(em, scope, id, user);
 */
export async function siteDelete(em: EntityManager, scope: SiteScope, siteId: string, actor: User): Promise<void> {
  const s = await siteLoad(em, scope, siteId);
  auditRecord(em, { action: 'site.delete', organizationId: scope.organizationId, actor, target: { type: 'site', id: s.id }, details: { workspaceId: scope.workspaceId, kind: s.kind, name: s.name } });
  em.remove(s);
  await em.flush();
}

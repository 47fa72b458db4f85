import type { EntityManager } from '@mikro-orm/sqlite';
import { WorkspaceSchema, type Workspace } from './workspace.entity.js';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { NotFoundError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';

/** A workspace as the API returns it. */
export interface WorkspaceView {
  id: string;
  name: string;
  description: string;
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
}

function workspaceView(w: Workspace): WorkspaceView {
  return {
    id: w.id,
    name: w.name,
    description: w.description,
    createdAt: w.createdAt.toISOString(),
    updatedAt: w.updatedAt.toISOString(),
    createdBy: w.createdBy ? { id: w.createdBy.id, name: w.createdBy.name } : null,
  };
}

async function workspaceLoad(em: EntityManager, organizationId: string, workspaceId: string): Promise<Workspace> {
  // Scoped by organization: another organization's id is simply "not found".
  const w = await em.findOne(WorkspaceSchema, { id: workspaceId, organization: organizationId }, { populate: ['createdBy'] });
  if (!w) throw new NotFoundError('Workspace');
  return w;
}

/**
 * Workspaces of an organization, most recently updated first.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns workspace views
 * @example
 * const list = await workspaceList(em, orgId);
 */
export async function workspaceList(em: EntityManager, organizationId: string): Promise<WorkspaceView[]> {
  const rows = await em.find(WorkspaceSchema, { organization: organizationId }, { populate: ['createdBy'], orderBy: { updatedAt: 'desc', id: 'asc' } });
  return rows.map(workspaceView);
}

/**
 * One workspace of an organization.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param workspaceId - the workspace
 * @returns the view
 * @throws NotFoundError when missing or in another organization
 * @example
 * const w = await workspaceGet(em, orgId, id);
 */
export async function workspaceGet(em: EntityManager, organizationId: string, workspaceId: string): Promise<WorkspaceView> {
  return workspaceView(await workspaceLoad(em, organizationId, workspaceId));
}

/**
 * Creates a workspace.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param actor - creator
 * @param input - name (1–120) and optional description (≤ 2000)
 * @returns the view
 * @example
 * await workspaceCreate(em, orgId, user, { name: 'Quillport north corridor 2027' });
 */
export async function workspaceCreate(em: EntityManager, organizationId: string, actor: User, input: { name: string; description?: string }): Promise<WorkspaceView> {
  const w = em.create(WorkspaceSchema, {
    id: entityId(),
    organization: em.getReference('Organization', organizationId),
    name: input.name,
    description: input.description ?? '',
    createdBy: em.getReference('User', actor.id),
  } as Workspace);
  auditRecord(em, { action: 'workspace.create', organizationId, actor, target: { type: 'workspace', id: w.id }, details: { name: input.name } });
  await em.flush();
  return workspaceGet(em, organizationId, w.id);
}

/**
 * Updates name and/or description.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param workspaceId - the workspace
 * @param actor - who changes it
 * @param input - fields to change
 * @returns the view
 * @example
 * await workspaceUpdate(em, orgId, id, user, { description: 'Two sites near the harbour' });
 */
export async function workspaceUpdate(
  em: EntityManager,
  organizationId: string,
  workspaceId: string,
  actor: User,
  input: { name?: string; description?: string },
): Promise<WorkspaceView> {
  const w = await workspaceLoad(em, organizationId, workspaceId);
  if (input.name !== undefined) w.name = input.name;
  if (input.description !== undefined) w.description = input.description;
  auditRecord(em, { action: 'workspace.update', organizationId, actor, target: { type: 'workspace', id: w.id }, details: { fields: Object.keys(input) } });
  await em.flush();
  return workspaceView(w);
}

/**
 * Deletes a workspace.
 * @param em - entity manager
 * @param organizationId - the organization
 * @param workspaceId - the workspace
 * @param actor - who deletes it
 * @returns nothing
 * @example
 * await workspaceDelete(em, orgId, id, user);
 */
export async function workspaceDelete(em: EntityManager, organizationId: string, workspaceId: string, actor: User): Promise<void> {
  const w = await workspaceLoad(em, organizationId, workspaceId);
  auditRecord(em, { action: 'workspace.delete', organizationId, actor, target: { type: 'workspace', id: w.id }, details: { name: w.name } });
  em.remove(w);
  await em.flush();
}

import type { EntityManager } from '@mikro-orm/sqlite';
import { NotFoundError } from '../common/errors.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';

/** Where a request points: organization and workspace (checked to belong together). */
export interface ScoringScope {
  organizationId: string;
  workspaceId: string;
}

/**
 * 404 unless the workspace belongs to the organization (other organizations' ids are "not found").
 * @param em entity manager
 * @param scope organization and workspace ids
 * @returns nothing
 * @example
 * await scoringScopeCheck(em, { organizationId, workspaceId });
 */
export async function scoringScopeCheck(em: EntityManager, scope: ScoringScope): Promise<void> {
  const count = await em.count(WorkspaceSchema, { id: scope.workspaceId, organization: scope.organizationId });
  if (count === 0) throw new NotFoundError('Workspace');
}

import { Router } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { workspaceCreate, workspaceDelete, workspaceGet, workspaceList, workspaceUpdate } from './workspace.service.js';
import { workspaceCreateSchema, workspaceUpdateSchema } from './workspace.schemas.js';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';

/**
 * `/api/organizations/:orgId/workspaces`: list, create, read, update, delete.
 * @param em - entity manager
 * @returns the router (mounted with the parent's `:orgId`)
 * @example
 * orgRouter.use('/:orgId/workspaces', workspaceRoutes(em));
 */
export function workspaceRoutes(em: EntityManager): Router {
  const router = Router({ mergeParams: true });
  const orgId = (req: { membership?: { organization: { id: string } } }) => req.membership!.organization.id;

  router.get('/', requireMembership(em, PERMISSIONS['workspace.read']), async (req, res) => {
    res.json({ workspaces: await workspaceList(em, orgId(req)) });
  });

  router.post('/', requireMembership(em, PERMISSIONS['workspace.create']), async (req, res) => {
    const input = inputParse(workspaceCreateSchema, req.body);
    res.status(201).json({ workspace: await workspaceCreate(em, orgId(req), sessionUser(req), input) });
  });

  router.get('/:workspaceId', requireMembership(em, PERMISSIONS['workspace.read']), async (req, res) => {
    res.json({ workspace: await workspaceGet(em, orgId(req), String(req.params.workspaceId)) });
  });

  router.patch('/:workspaceId', requireMembership(em, PERMISSIONS['workspace.update']), async (req, res) => {
    const input = inputParse(workspaceUpdateSchema, req.body);
    res.json({ workspace: await workspaceUpdate(em, orgId(req), String(req.params.workspaceId), sessionUser(req), input) });
  });

  router.delete('/:workspaceId', requireMembership(em, PERMISSIONS['workspace.delete']), async (req, res) => {
    await workspaceDelete(em, orgId(req), String(req.params.workspaceId), sessionUser(req));
    res.status(204).end();
  });

  return router;
}

import { Router } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { organizationCreate, organizationMembers, organizationRename, organizationsOfUser, organizationView } from './organization.service.js';
import { organizationNameSchema } from './organization.schemas.js';
import { memberRemove, memberRoleChange } from './member.service.js';
import { memberRoleSchema } from './organization.schemas.js';
import { auditList } from '../audit/audit.service.js';
import { auditQuerySchema } from '../audit/audit.schemas.js';
import { requireMembership, requireSession, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { workspaceRoutes } from '../workspace/workspace.routes.js';

/**
 * `/api/organizations`: mine, create, read, rename, members, audit log, and the workspace routes.
 * @param em - entity manager
 * @returns the router
 * @example
 * app.use('/api/organizations', organizationRoutes(orm.em));
 */
export function organizationRoutes(em: EntityManager): Router {
  const router = Router();
  router.use(requireSession());

  router.get('/', async (req, res) => {
    res.json({ organizations: await organizationsOfUser(em, sessionUser(req).id) });
  });

  router.post('/', async (req, res) => {
    const { name } = inputParse(organizationNameSchema, req.body);
    const org = await organizationCreate(em, sessionUser(req), name);
    res.status(201).json({ organization: organizationView(org) });
  });

  router.get('/:orgId', requireMembership(em, PERMISSIONS['organization.read']), (req, res) => {
    res.json({ organization: organizationView(req.membership!.organization), role: req.membership!.role });
  });

  router.patch('/:orgId', requireMembership(em, PERMISSIONS['organization.rename']), async (req, res) => {
    const { name } = inputParse(organizationNameSchema, req.body);
    const org = await organizationRename(em, req.membership!.organization, sessionUser(req), name);
    res.json({ organization: organizationView(org) });
  });

  router.get('/:orgId/members', requireMembership(em, PERMISSIONS['members.read']), async (req, res) => {
    res.json({ members: await organizationMembers(em, req.membership!.organization.id) });
  });

  router.patch('/:orgId/members/:userId', requireMembership(em, PERMISSIONS['members.manage']), async (req, res) => {
    const { role } = inputParse(memberRoleSchema, req.body);
    res.json({ member: await memberRoleChange(em, req.membership!.organization, sessionUser(req), String(req.params.userId), role) });
  });

  router.delete('/:orgId/members/:userId', requireMembership(em, PERMISSIONS['members.manage']), async (req, res) => {
    await memberRemove(em, req.membership!.organization, sessionUser(req), String(req.params.userId));
    res.status(204).end();
  });
  router.get('/:orgId/audit-events', requireMembership(em, PERMISSIONS['audit.read']), async (req, res) => {
    const query = inputParse(auditQuerySchema, req.query);
    res.json(await auditList(em, req.membership!.organization.id, query));
  });

  router.use('/:orgId/workspaces', workspaceRoutes(em));
  return router;
}

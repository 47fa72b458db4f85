import { Router, type Request } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { siteCreateSchema, siteImportFieldsSchema, siteListQuerySchema, siteUpdateSchema } from './site.schemas.js';
import { siteFileReceive, siteFileUse, siteImport, siteImportPreview } from './site-import.js';
import { siteCreate, siteDelete, siteList, siteUpdate, type SiteScope } from './site.service.js';

function scopeOf(req: Request): SiteScope {
  return { organizationId: req.membership!.organization.id, workspaceId: String(req.params.workspaceId) };
}

/**
 * `/api/organizations/:orgId/workspaces/:workspaceId/sites`: list (filter by kind), create, CSV/XLSX import
 * preview (columns and guessed mapping) and import (all or nothing), edit/move, delete.
 * @param em - entity manager
 * @returns the router (mounted with the parent's `:orgId` and `:workspaceId`)
 * @example
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId/sites', siteRoutes(em));
 */
export function siteRoutes(em: EntityManager): Router {
  const router = Router({ mergeParams: true });

  router.get('/', requireMembership(em, PERMISSIONS['site.read']), async (req, res) => {
    const { kind } = inputParse(siteListQuerySchema, req.query);
    res.json({ sites: await siteList(em, scopeOf(req), kind) });
  });

  router.post('/', requireMembership(em, PERMISSIONS['site.write']), async (req, res) => {
    const input = inputParse(siteCreateSchema, req.body);
    res.status(201).json({ site: await siteCreate(em, scopeOf(req), sessionUser(req), input) });
  });

  router.post('/import/preview', requireMembership(em, PERMISSIONS['site.write']), siteFileReceive(), async (req, res) => {
    res.json(await siteFileUse(req.file!.path, (path) => siteImportPreview(em, scopeOf(req), path)));
  });

  router.post('/import', requireMembership(em, PERMISSIONS['site.write']), siteFileReceive(), async (req, res) => {
    const result = await siteFileUse(req.file!.path, (path) => siteImport(em, scopeOf(req), sessionUser(req), path, inputParse(siteImportFieldsSchema, req.body)));
    res.status(201).json(result);
  });

  router.patch('/:siteId', requireMembership(em, PERMISSIONS['site.write']), async (req, res) => {
    const input = inputParse(siteUpdateSchema, req.body);
    res.json({ site: await siteUpdate(em, scopeOf(req), String(req.params.siteId), sessionUser(req), input) });
  });

  router.delete('/:siteId', requireMembership(em, PERMISSIONS['site.write']), async (req, res) => {
    await siteDelete(em, scopeOf(req), String(req.params.siteId), sessionUser(req));
    res.status(204).end();
  });

  return router;
}

import { Router, type Request } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import type { Mailer } from '../mail/mailer.js';
import { reportFileName, reportSend } from '../report/report-download.js';
import { reportFromShortlist } from '../report/report-model.js';
import { reportWorkbook } from '../report/report-xlsx.js';
import { shortlistShare } from './shortlist-share.js';
import {
  shortlistCreateSchema,
  shortlistRenameSchema,
  shortlistShareSchema,
  shortlistVersionQuerySchema,
  shortlistVersionSchema,
} from './shortlist.schemas.js';
import {
  shortlistCreate,
  shortlistDelete,
  shortlistGet,
  shortlistList,
  shortlistRename,
  shortlistVersionCreate,
  type ShortlistScope,
} from './shortlist.service.js';

function scopeOf(req: Request): ShortlistScope {
  return {
    organizationId: req.membership!.organization.id,
    workspaceId: String(req.params.workspaceId),
  };
}

/**
 * `/api/organizations/:orgId/workspaces/:workspaceId/shortlists`: list, create (version 1), read
 * (any version), new version, rename, delete, share by e-mail, XLSX report. Owners and planners
 * write; every role reads and downloads.
 * @param deps - entity manager, mailer and the app's public URL (links in the share e-mail)
 * @returns the router (mounted with the parent's `:orgId` and `:workspaceId`)
 * @example
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId/shortlists', shortlistRoutes({ em, mailer, publicUrl }));
 */
export function shortlistRoutes(deps: {
  em: EntityManager;
  mailer: Mailer;
  publicUrl: string;
}): Router {
  const { em } = deps;
  const router = Router({ mergeParams: true });
  const read = requireMembership(em, PERMISSIONS['shortlist.read']);
  const write = requireMembership(em, PERMISSIONS['shortlist.write']);
  const idOf = (req: Request) => String(req.params.shortlistId);

  router.get('/', read, async (req, res) => {
    res.json({
      shortlists: await shortlistList(
        em,
        req.membership!.organization.id,
        String(req.params.workspaceId),
      ),
    });
  });

  router.post('/', write, async (req, res) => {
    const input = inputParse(shortlistCreateSchema, req.body);
    res
      .status(201)
      .json({ shortlist: await shortlistCreate(em, scopeOf(req), sessionUser(req), input) });
  });

  router.get('/:shortlistId', read, async (req, res) => {
    const { version } = inputParse(shortlistVersionQuerySchema, req.query);
    res.json({ shortlist: await shortlistGet(em, scopeOf(req), idOf(req), version) });
  });

  router.post('/:shortlistId/versions', write, async (req, res) => {
    const input = inputParse(shortlistVersionSchema, req.body);
    res
      .status(201)
      .json({
        shortlist: await shortlistVersionCreate(
          em,
          scopeOf(req),
          idOf(req),
          sessionUser(req),
          input,
        ),
      });
  });

  router.patch('/:shortlistId', write, async (req, res) => {
    const { name } = inputParse(shortlistRenameSchema, req.body);
    res.json({
      shortlist: await shortlistRename(em, scopeOf(req), idOf(req), sessionUser(req), name),
    });
  });

  router.delete('/:shortlistId', write, async (req, res) => {
    await shortlistDelete(em, scopeOf(req), idOf(req), sessionUser(req));
    res.status(204).end();
  });

  router.post('/:shortlistId/share', write, async (req, res) => {
    const input = inputParse(shortlistShareSchema, req.body);
    res.json(await shortlistShare(em, scopeOf(req), idOf(req), sessionUser(req), input, deps));
  });

  router.get('/:shortlistId/export.xlsx', read, async (req, res) => {
    const { version } = inputParse(shortlistVersionQuerySchema, req.query);
    const scope = scopeOf(req);
    const shortlist = await shortlistGet(em, scope, idOf(req), version);
    const body = await reportWorkbook(reportFromShortlist(shortlist), new Date());
    await reportSend(
      em,
      res,
      {
        body,
        name: reportFileName(
          [shortlist.workspaceName, shortlist.name],
          `v${shortlist.version.version}`,
          'xlsx',
        ),
        kind: 'xlsx',
      },
      {
        action: 'export.shortlist_xlsx',
        organizationId: scope.organizationId,
        actor: sessionUser(req),
        target: { type: 'shortlist', id: shortlist.id },
        details: {
          workspaceId: scope.workspaceId,
          name: shortlist.name,
          version: shortlist.version.version,
        },
      },
    );
  });

  return router;
}

/**
 * `GET /api/organizations/:orgId/shortlists`: every shortlist of the organization across
 * workspaces, most recently changed first (the executive's list; every role).
 * @param em - entity manager
 * @returns the router (mounted with `:orgId`)
 * @example
 * app.use('/api/organizations/:orgId/shortlists', shortlistOrgRoutes(em));
 */
export function shortlistOrgRoutes(em: EntityManager): Router {
  const router = Router({ mergeParams: true });
  router.get('/', requireMembership(em, PERMISSIONS['shortlist.read']), async (req, res) => {
    res.json({ shortlists: await shortlistList(em, req.membership!.organization.id, null) });
  });
  return router;
}

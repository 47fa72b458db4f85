import { Router, type Request } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { scoringRunGet, type ScoringScope } from '../scoring/scoring.service.js';
import { WorkspaceSchema } from '../workspace/workspace.entity.js';
import { reportRankingCsv } from './report-csv.js';
import { reportFileName, reportSend } from './report-download.js';
import { reportSitesGeojson } from './report-geojson.js';
import { reportFromRun } from './report-model.js';
import { reportWorkbook } from './report-xlsx.js';

function scopeOf(req: Request): ScoringScope {
  return {
    organizationId: req.membership!.organization.id,
    workspaceId: String(req.params.workspaceId),
  };
}

async function runWithWorkspace(em: EntityManager, req: Request) {
  const scope = scopeOf(req);
  const run = await scoringRunGet(em, scope, String(req.params.runId));
  const workspace = await em.findOneOrFail(WorkspaceSchema, { id: scope.workspaceId });
  return { scope, run, workspaceName: workspace.name };
}

/**
 * Downloads of a scoring run (every role; sites and aggregates only, never customer points):
 * `GET /:runId/export.xlsx` (summary + one sheet per candidate), `GET /:runId/ranking.csv`,
 * `GET /:runId/sites.geojson`. 409 RUN_NOT_READY until the run has succeeded; audited as
 * export.ranking_xlsx / export.ranking_csv / export.sites_geojson.
 * @param em - entity manager
 * @returns the router (mounted at `…/workspaces/:workspaceId/scoring-runs`)
 * @example
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId/scoring-runs', reportRunRoutes(em));
 */
export function reportRunRoutes(em: EntityManager): Router {
  const router = Router({ mergeParams: true });
  const read = requireMembership(em, PERMISSIONS['scoring.read']);

  router.get('/:runId/export.xlsx', read, async (req, res) => {
    const { scope, run, workspaceName } = await runWithWorkspace(em, req);
    const body = await reportWorkbook(reportFromRun(run, workspaceName), new Date());
    await reportSend(
      em,
      res,
      { body, name: reportFileName([workspaceName, run.name], 'ranking', 'xlsx'), kind: 'xlsx' },
      {
        action: 'export.ranking_xlsx',
        organizationId: scope.organizationId,
        actor: sessionUser(req),
        target: { type: 'scoring_run', id: run.id },
        details: { workspaceId: scope.workspaceId, name: run.name },
      },
    );
  });

  router.get('/:runId/ranking.csv', read, async (req, res) => {
    const { scope, run, workspaceName } = await runWithWorkspace(em, req);
    const body = reportRankingCsv(reportFromRun(run, workspaceName));
    await reportSend(
      em,
      res,
      { body, name: reportFileName([workspaceName, run.name], 'ranking', 'csv'), kind: 'csv' },
      {
        action: 'export.ranking_csv',
        organizationId: scope.organizationId,
        actor: sessionUser(req),
        target: { type: 'scoring_run', id: run.id },
        details: { workspaceId: scope.workspaceId, name: run.name },
      },
    );
  });

  router.get('/:runId/sites.geojson', read, async (req, res) => {
    const { scope, run, workspaceName } = await runWithWorkspace(em, req);
    const body = JSON.stringify(reportSitesGeojson(run));
    await reportSend(
      em,
      res,
      {
        body,
        name: reportFileName([workspaceName, run.name], 'sites', 'geojson'),
        kind: 'geojson',
      },
      {
        action: 'export.sites_geojson',
        organizationId: scope.organizationId,
        actor: sessionUser(req),
        target: { type: 'scoring_run', id: run.id },
        details: { workspaceId: scope.workspaceId, name: run.name },
      },
    );
  });

  return router;
}

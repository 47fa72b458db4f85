import { Router, type Request } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { ScoringRunner } from '../../jobs/scoring-runner.js';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import type { ScoringScope } from './scoring-scope.js';
import { scoringSettingsGet, scoringSettingsSave } from './scoring-settings.service.js';
import { scoringRunCreate, scoringRunDelete, scoringRunGet, scoringRunList, scoringSetCreate, scoringStabilityStart } from './scoring.service.js';
import { scoringRunCreateSchema, scoringSettingsInputSchema, siteSetCreateSchema } from './scoring.schemas.js';

function scopeOf(req: Request): ScoringScope {
  return { organizationId: req.membership!.organization.id, workspaceId: String(req.params.workspaceId) };
}

/**
 * `/api/organizations/:orgId/workspaces/:workspaceId`: `scoring-settings` (GET, PUT) and
 * `scoring-runs` (list, create, get, delete, stability, sets). Everyone reads; owners and planners write.
 * @param em entity manager
 * @param runner the scoring runner (worker threads)
 * @returns the router (mounted with the parent's `:orgId` and `:workspaceId`)
 * @example
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId', scoringRoutes(em, runner));
 */
export function scoringRoutes(em: EntityManager, runner: ScoringRunner): Router {
  const router = Router({ mergeParams: true });
  const read = requireMembership(em, PERMISSIONS['scoring.read']);
  const write = requireMembership(em, PERMISSIONS['scoring.write']);

  router.get('/scoring-settings', read, async (req, res) => {
    res.json({ settings: await scoringSettingsGet(em, scopeOf(req)) });
  });

  router.put('/scoring-settings', write, async (req, res) => {
    const input = inputParse(scoringSettingsInputSchema, req.body);
    res.json({ settings: await scoringSettingsSave(em, scopeOf(req), sessionUser(req), input) });
  });

  router.get('/scoring-runs', read, async (req, res) => {
    res.json({ runs: await scoringRunList(em, scopeOf(req)) });
  });

  router.post('/scoring-runs', write, async (req, res) => {
    const input = inputParse(scoringRunCreateSchema, req.body);
    res.status(202).json({ run: await scoringRunCreate(em, scopeOf(req), sessionUser(req), input, runner) });
  });

  router.get('/scoring-runs/:runId', read, async (req, res) => {
    res.json({ run: await scoringRunGet(em, scopeOf(req), String(req.params.runId)) });
  });

  router.delete('/scoring-runs/:runId', write, async (req, res) => {
    await scoringRunDelete(em, scopeOf(req), String(req.params.runId), sessionUser(req), runner);
    res.status(204).end();
  });

  router.post('/scoring-runs/:runId/stability', write, async (req, res) => {
    res.status(202).json({ run: await scoringStabilityStart(em, scopeOf(req), String(req.params.runId), runner) });
  });

  router.post('/scoring-runs/:runId/sets', write, async (req, res) => {
    const input = inputParse(siteSetCreateSchema, req.body);
    res.status(201).json({ set: await scoringSetCreate(em, scopeOf(req), String(req.params.runId), sessionUser(req), input, runner) });
  });

  return router;
}

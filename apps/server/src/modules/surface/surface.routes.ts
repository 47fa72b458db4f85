import { Router, type Request, type Response } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { AppError } from '../common/errors.js';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { coreInputErrors } from './surface-errors.js';
import { PRIVACY_MIN_BANDWIDTH_M } from './surface-plan.js';
import type { Surface } from './surface.entity.js';
import { exportFileName, surfaceExportAudit, surfaceGeotiff } from './surface-export.js';
import { surfaceContours, surfaceDifferenceRaster, surfaceGridLoad, surfaceValueAt, surfaceWebRaster } from './surface-results.js';
import { surfaceCancel, surfaceCreate, surfaceDelete, surfaceEstimate, surfaceList, surfaceLoad, surfaceRetry, surfaceScopeCheck, surfaceView, type SurfaceScope } from './surface.service.js';
import { surfaceCreateSchema, valueQuerySchema, webRasterQuerySchema } from './surface.schemas.js';

function scopeOf(req: Request): SurfaceScope {
  return { organizationId: req.membership!.organization.id, workspaceId: String(req.params.workspaceId) };
}

/**
 * Executives see surfaces smoothed at ≥ 564 m only (DOMAIN.md §3): finer ones could show single homes.
 * @param req the request (membership loaded)
 * @param surface the run
 * @returns nothing
 * @throws ForbiddenError PRIVACY_MIN_BANDWIDTH for an executive and a finer surface
 */
function executiveBandwidthCheck(req: Request, surface: Surface): void {
  const h = surface.resolved?.bandwidth.value ?? Infinity;
  if (req.membership?.role === 'executive' && h < PRIVACY_MIN_BANDWIDTH_M) {
    throw new AppError(
      403,
      'PRIVACY_MIN_BANDWIDTH',
      `This surface uses a ${Math.round(h)} m bandwidth; executive views need at least ${PRIVACY_MIN_BANDWIDTH_M} m so single customers cannot be picked out. Ask an analyst for a smoother surface.`,
    );
  }
}

function rasterSend(res: Response, r: { values: Float32Array; width: number; height: number; bounds: { west: number; south: number; east: number; north: number }; max: number; unit: string }): void {
  const b = r.bounds;
  res.set({
    'Content-Type': 'application/octet-stream',
    'X-Raster-Width': String(r.width),
    'X-Raster-Height': String(r.height),
    'X-Raster-Bounds': [b.west, b.south, b.east, b.north].join(','),
    'X-Raster-Unit': r.unit,
    'X-Raster-Max': String(r.max),
    'Cache-Control': 'private, max-age=300',
  });
  // Float32 little-endian (the platform order on every supported server).
  res.send(Buffer.from(r.values.buffer, r.values.byteOffset, r.values.byteLength));
}

/**
 * `/api/organizations/:orgId/workspaces/:workspaceId/surfaces`: estimate, create, list, read,
 * cancel, retry, delete, the results (web raster, value, contours, difference) and the downloads
 * (GeoTIFF, contour GeoJSON).
 * @param em entity manager
 * @param runner the process's runner (woken on enqueue and cancel)
 * @returns the router (mounted with the parent's params)
 * @example
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId/surfaces', surfaceRoutes(em, runner));
 */
export function surfaceRoutes(em: EntityManager, runner: { wake(): void }): Router {
  const router = Router({ mergeParams: true });
  const read = requireMembership(em, PERMISSIONS['surface.read']);
  const write = requireMembership(em, PERMISSIONS['surface.write']);

  router.post('/estimate', write, async (req, res) => {
    res.json(await surfaceEstimate(em, scopeOf(req), inputParse(surfaceCreateSchema, req.body)));
  });

  router.post('/', write, async (req, res) => {
    const surface = await surfaceCreate(em, scopeOf(req), sessionUser(req), inputParse(surfaceCreateSchema, req.body));
    runner.wake();
    res.status(201).json({ surface });
  });

  router.get('/', read, async (req, res) => {
    res.json({ surfaces: await surfaceList(em, scopeOf(req)) });
  });

  router.get('/:surfaceId', read, async (req, res) => {
    await surfaceScopeCheck(em, scopeOf(req));
    res.json({ surface: surfaceView(await surfaceLoad(em, scopeOf(req), String(req.params.surfaceId))) });
  });

  router.post('/:surfaceId/cancel', write, async (req, res) => {
    const surface = await surfaceCancel(em, scopeOf(req), String(req.params.surfaceId), sessionUser(req));
    runner.wake();
    res.json({ surface });
  });

  router.post('/:surfaceId/retry', write, async (req, res) => {
    const surface = await surfaceRetry(em, scopeOf(req), String(req.params.surfaceId), sessionUser(req));
    runner.wake();
    res.json({ surface });
  });

  router.delete('/:surfaceId', write, async (req, res) => {
    await surfaceDelete(em, scopeOf(req), String(req.params.surfaceId), sessionUser(req));
    runner.wake();
    res.status(204).end();
  });

  router.get('/:surfaceId/web-raster', read, async (req, res) => {
    const { maxSize } = inputParse(webRasterQuerySchema, req.query);
    const g = await surfaceGridLoad(em, scopeOf(req), String(req.params.surfaceId));
    executiveBandwidthCheck(req, g.surface);
    rasterSend(res, coreInputErrors(() => surfaceWebRaster(g, maxSize)));
  });

  router.get('/:surfaceId/value', read, async (req, res) => {
    const { lon, lat } = inputParse(valueQuerySchema, req.query);
    const g = await surfaceGridLoad(em, scopeOf(req), String(req.params.surfaceId));
    executiveBandwidthCheck(req, g.surface);
    res.json(surfaceValueAt(g, lon, lat));
  });

  router.get('/:surfaceId/contours', read, async (req, res) => {
    executiveBandwidthCheck(req, await surfaceLoad(em, scopeOf(req), String(req.params.surfaceId)));
    res.type('application/geo+json').json(await surfaceContours(em, scopeOf(req), String(req.params.surfaceId)));
  });

  router.get('/:surfaceId/export.tif', read, async (req, res) => {
    const g = await surfaceGridLoad(em, scopeOf(req), String(req.params.surfaceId));
    executiveBandwidthCheck(req, g.surface);
    const bytes = coreInputErrors(() => surfaceGeotiff(g));
    await surfaceExportAudit(em, scopeOf(req), sessionUser(req), g, 'geotiff');
    res.set({
      'Content-Type': 'image/tiff',
      'Content-Disposition': `attachment; filename="${exportFileName(g.surface.name, 'tif')}"`,
      'Cache-Control': 'no-store',
    });
    res.send(Buffer.from(bytes));
  });

  router.get('/:surfaceId/contours.geojson', read, async (req, res) => {
    const surface = await surfaceLoad(em, scopeOf(req), String(req.params.surfaceId));
    executiveBandwidthCheck(req, surface);
    const fc = await surfaceContours(em, scopeOf(req), surface.id);
    await surfaceExportAudit(em, scopeOf(req), sessionUser(req), { surface }, 'contours');
    res.set({
      'Content-Type': 'application/geo+json',
      'Content-Disposition': `attachment; filename="${exportFileName(surface.name, 'geojson')}"`,
      'Cache-Control': 'no-store',
    });
    res.send(JSON.stringify(fc));
  });

  router.get('/:surfaceId/difference/:otherId/web-raster', read, async (req, res) => {
    const { maxSize } = inputParse(webRasterQuerySchema, req.query);
    const base = await surfaceGridLoad(em, scopeOf(req), String(req.params.surfaceId));
    const other = await surfaceGridLoad(em, scopeOf(req), String(req.params.otherId));
    executiveBandwidthCheck(req, base.surface);
    executiveBandwidthCheck(req, other.surface);
    rasterSend(res, coreInputErrors(() => surfaceDifferenceRaster(base, other, maxSize)));
  });

  return router;
}

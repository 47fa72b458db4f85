import { geotiffFromGrid } from '@demandscape/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import type { User } from '../user/user.entity.js';
import { surfaceUnitFactor, type SurfaceGrid } from './surface-results.js';
import type { SurfaceScope } from './surface.service.js';

/**
 * A download file name from a run's name: letters, digits, space, dot, dash and underscore kept
 * (header-safe ASCII), everything else becomes '_'.
 * @param name the run's name
 * @param extension without the dot, e.g. 'tif'
 * @returns e.g. 'Harbour visits.tif'; 'surface.<extension>' when nothing usable is left
 * @example
 * exportFileName('Harbour · "north"', 'tif'); // 'Harbour _ _north_.tif'
 */
export function exportFileName(name: string, extension: string): string {
  const base = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9 ._-]/g, '_')
    .replace(/^[ .]+|[ .]+$/g, '')
    .slice(0, 100);
  return `${/[A-Za-z0-9]/.test(base) ? base : 'surface'}.${extension}`;
}

/**
 * The run's metric grid as a single-band Float32 GeoTIFF: north-up, values in the run's unit,
 * NaN = no data (declared in GDAL_NODATA), CRS by EPSG code or — for a CRS without one (LAEA) —
 * user-defined with its proj4 string in the citation. Holds grid cells only, never customer points.
 * @param g from surfaceGridLoad (a succeeded run)
 * @returns the file bytes
 * @example
 * const bytes = surfaceGeotiff(await surfaceGridLoad(em, scope, id));
 */
export function surfaceGeotiff(g: SurfaceGrid): ArrayBuffer {
  const unit = g.surface.params.unit;
  const factor = surfaceUnitFactor(unit);
  const values = new Float32Array(g.values.length);
  for (let k = 0; k < values.length; k++) values[k] = g.values[k] * factor;
  const p = g.surface.resolved!.projection;
  const perUnit = unit === 'sqmi' ? 'per sq mi' : 'per km2';
  const crs = p.epsg ? `EPSG:${p.epsg}` : p.proj4;
  // The citation must be printable ASCII; labels or names could hold other characters.
  const citation = `Demandscape demand surface, weight ${perUnit}; CRS ${crs}`.replace(/[^\x20-\x7e]/g, '?');
  return geotiffFromGrid(values, g.spec, { epsg: p.epsg ?? undefined, noData: Number.NaN, citation });
}

/**
 * Records a download of a run's results (grid or contours; no point data is ever exported).
 * @param em entity manager
 * @param scope organization and workspace
 * @param actor who downloaded
 * @param g the run's grid
 * @param format 'geotiff' or 'contours'
 * @returns nothing (flushed)
 * @example
 * await surfaceExportAudit(em, scope, user, g, 'geotiff');
 */
export async function surfaceExportAudit(em: EntityManager, scope: SurfaceScope, actor: User, g: Pick<SurfaceGrid, 'surface'>, format: 'geotiff' | 'contours'): Promise<void> {
  const s = g.surface;
  const grid = s.resolved?.grid;
  auditRecord(em, {
    action: format === 'geotiff' ? 'export.surface_geotiff' : 'export.surface_contours',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'surface', id: s.id },
    details: { name: s.name, unit: s.params.unit, ...(format === 'geotiff' && grid ? { width: grid.width, height: grid.height, cellSize: grid.cellSize } : {}) },
  });
  await em.flush();
}

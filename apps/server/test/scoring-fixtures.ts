import { projectionConverter, type LocalProjection, type ScoringSurface, type Site } from '@demandscape/core';
import type { DemandscapeApp } from '../src/app.js';
import { SurfaceRasterSchema, SurfaceSchema } from '../src/modules/surface/surface.entity.js';
import { QUILLPORT } from './surface-fixtures.js';
import type { Response } from 'supertest';
import type { TestClient } from './utils.js';

/** A run as the API sent it (supertest's untyped JSON body). */
type RunBody = Response['body'];

/** lon/lat of a point `e` km east and `n` km north of Quillport's centre (local flat-earth offsets, as the demo points). */
export function quillportAt(e: number, n: number): { lon: number; lat: number } {
  const mPerDegLat = 111_320;
  const mPerDegLon = mPerDegLat * Math.cos((QUILLPORT.lat * Math.PI) / 180);
  return { lon: QUILLPORT.lon + (e * 1000) / mPerDegLon, lat: QUILLPORT.lat + (n * 1000) / mPerDegLat };
}

/** Invented Larchloaf sites around the demo clusters (candidates near cluster centres, two own stores, one rival). */
export const SCORING_SITES = [
  { kind: 'candidate', name: 'Quay corner', ...quillportAt(0.3, 0.2), attractiveness: 120 },
  { kind: 'candidate', name: 'Lantern Hill', ...quillportAt(3.4, 1.6), attractiveness: 90 },
  { kind: 'candidate', name: 'Saltmarsh Lane', ...quillportAt(-2.3, -2.1), attractiveness: 150 },
  { kind: 'candidate', name: 'Far Point', ...quillportAt(5.5, -5), attractiveness: 100 },
  { kind: 'own', name: 'Harbour Row', ...quillportAt(-0.5, -0.3), attractiveness: 140 },
  { kind: 'own', name: 'Tidewater Market', ...quillportAt(2.8, 2.2), attractiveness: 110 },
  { kind: 'competitor', name: 'Rival Crumb', ...quillportAt(-1.8, -1.2), attractiveness: 160 },
] as const;

/**
 * A stored surface as the scoring engine reads it (NaN → 0), with a converter for sites.
 * @param ds the app
 * @param surfaceId the surface
 * @returns the scoring surface and a function projecting sites into it
 * @example
 * const { surface, project } = await storedScoringSurface(ds, id);
 */
export async function storedScoringSurface(ds: Pick<DemandscapeApp, 'orm'>, surfaceId: string): Promise<{ surface: ScoringSurface; project: (id: string, kind: Site['kind'], lon: number, lat: number, a: number) => Site }> {
  const em = ds.orm.em.fork();
  const s = await em.findOneOrFail(SurfaceSchema, surfaceId);
  const r = await em.findOneOrFail(SurfaceRasterSchema, { surface: surfaceId }, { populate: ['data'] });
  const f32 = new Float32Array(new Uint8Array(r.data).buffer);
  const values = Float64Array.from(f32, (v) => (Number.isNaN(v) ? 0 : v));
  const c = projectionConverter({ ...s.resolved!.projection, centerLon: 0, centerLat: 0 } as LocalProjection);
  return {
    surface: { spec: { ...s.resolved!.grid }, values },
    project: (id, kind, lon, lat, a) => {
      const [x, y] = c.forwardPoint(lon, lat);
      return { id, kind, x, y, attractiveness: a };
    },
  };
}

/**
 * Polls a scoring run until `done` says so.
 * @param client a reader
 * @param path the run's URL
 * @param done predicate on the run JSON
 * @param timeoutMs limit
 * @returns the run JSON
 * @example
 * const run = await scoringRunWait(owner, `${base}/scoring-runs/${id}`, (r) => r.status === 'succeeded');
 */
export async function scoringRunWait(client: TestClient, path: string, done: (run: RunBody) => boolean, timeoutMs = 60_000): Promise<RunBody> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const run = (await client.get(path).expect(200)).body.run;
    if (done(run)) return run;
    if (Date.now() > until) throw new Error(`scoring run still ${run.status} after ${timeoutMs} ms: ${JSON.stringify(run).slice(0, 600)}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

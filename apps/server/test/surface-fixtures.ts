import { randomUUID } from 'node:crypto';
import type { DemandscapeApp } from '../src/app.js';
import { CustomerFileSchema } from '../src/modules/customer-file/customer-file.entity.js';
import { CustomerPointChunkSchema } from '../src/modules/customer-file/customer-point-chunk.entity.js';
import { customerPointsPack } from '../src/modules/customer-file/customer-points.js';
import { surfaceCompute } from '../src/modules/surface/surface-compute.js';
import { SurfaceRasterSchema, SurfaceSchema } from '../src/modules/surface/surface.entity.js';
import { surfaceParamsSchema } from '../src/modules/surface/surface.schemas.js';

/** Centre of the invented city of Quillport (open sea): lon −38.5°, lat 44.5°. */
export const QUILLPORT = { lon: -38.5, lat: 44.5 };

/** Three invented neighbourhood clusters of Quillport: centre east/north of the city centre and sd, in km. */
export const QUILLPORT_CLUSTERS: readonly { e: number; n: number; sd: number }[] = [
  { e: 0, n: 0, sd: 1.2 },
  { e: 3.5, n: 1.5, sd: 0.6 },
  { e: -2.5, n: -2, sd: 1.5 },
];

/**
 * Seeded uniforms on [0, 1) from Mulberry32 (public-domain PRNG); the same seed gives the same stream.
 * @param seed integer seed (taken as unsigned 32-bit)
 * @returns the next uniform on each call
 * @example
 * const rand = uniformSeeded(7); const u = rand();
 */
export function uniformSeeded(seed: number): () => number {
  let s = seed >>> 0;
  return (): number => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Seeded, clustered, invented customers around Quillport: three neighbourhood clusters (sd 0.6–1.5 km)
 * and a thin background, weights 1–3 (visits).
 * @param n how many
 * @param seed integer seed
 * @returns lon/lat degrees and weights
 * @example
 * const pts = demoPoints(2000);
 */
export function demoPoints(n: number, seed = 7): { lon: Float64Array; lat: Float64Array; w: Float64Array; count: number } {
  const rand = uniformSeeded(seed);
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const clusters = QUILLPORT_CLUSTERS;
  const mPerDegLat = 111_320;
  const mPerDegLon = mPerDegLat * Math.cos((QUILLPORT.lat * Math.PI) / 180);
  const lon = new Float64Array(n);
  const lat = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    let e: number;
    let no: number;
    if (rand() < 0.1) {
      e = (rand() - 0.5) * 12;
      no = (rand() - 0.5) * 12;
    } else {
      const c = clusters[Math.floor(rand() * clusters.length)];
      e = c.e + c.sd * normal();
      no = c.n + c.sd * normal();
    }
    lon[k] = QUILLPORT.lon + (e * 1000) / mPerDegLon;
    lat[k] = QUILLPORT.lat + (no * 1000) / mPerDegLat;
    w[k] = 1 + Math.floor(rand() * 3);
  }
  return { lon, lat, w, count: n };
}

/**
 * Stores an imported customer file with points in the documented chunk format (as an import does).
 * @param ds the app
 * @param organizationId org
 * @param workspaceId workspace
 * @param points the points
 * @returns the file id
 * @example
 * const fileId = await customerFileStored(ds, orgId, wsId, demoPoints(2000));
 */
export async function customerFileStored(
  ds: Pick<DemandscapeApp, 'orm'>,
  organizationId: string,
  workspaceId: string,
  points: { lon: Float64Array; lat: Float64Array; w: Float64Array; count: number },
): Promise<string> {
  const em = ds.orm.em.fork();
  const id = randomUUID();
  let total = 0;
  for (let k = 0; k < points.count; k++) total += points.w[k];
  em.create(CustomerFileSchema, {
    id,
    organization: organizationId,
    workspace: workspaceId,
    name: 'larchloaf-loyalty.csv',
    sizeBytes: points.count * 30,
    format: 'csv',
    status: 'imported',
    error: null,
    detected: { columns: ['lon', 'lat', 'visits'], hasHeader: true, delimiter: ',', decimalComma: false, encoding: 'utf-8', suggested: {} },
    mapping: { lon: 'lon', lat: 'lat', weight: 'visits' },
    weightKind: 'visits',
    weightLabel: 'visits per year',
    rowCount: points.count,
    acceptedCount: points.count,
    totalWeight: total,
    importedAt: new Date(),
  } as never);
  await em.flush();
  await customerPointsChunksStore(ds, id, points);
  return id;
}

/**
 * Writes a file's point chunks (≤ 65,536 points each).
 * @param ds the app
 * @param customerFileId the file
 * @param points the points
 * @returns nothing
 * @example
 * await customerPointsChunksStore(ds, fileId, points);
 */
export async function customerPointsChunksStore(
  ds: Pick<DemandscapeApp, 'orm'>,
  customerFileId: string,
  points: { lon: Float64Array; lat: Float64Array; w: Float64Array; count: number },
): Promise<void> {
  const em = ds.orm.em.fork();
  const size = 65_536;
  for (let seq = 0, start = 0; start < points.count; seq++, start += size) {
    const count = Math.min(size, points.count - start);
    em.create(CustomerPointChunkSchema, {
      id: randomUUID(),
      customerFile: customerFileId,
      seq,
      count,
      data: customerPointsPack(points, start, count),
      flags: Buffer.alloc(count),
    } as never);
  }
  await em.flush();
}

/**
 * Polls a surface until `done` says so (or fails after `timeoutMs`).
 * @param get fetches the surface view
 * @param done predicate
 * @param timeoutMs limit
 * @returns the last view
 * @example
 * const s = await surfaceWait(() => getSurface(id), (s) => s.status === 'succeeded');
 */
export async function surfaceWait<T extends { status: string }>(get: () => Promise<T>, done: (s: T) => boolean, timeoutMs = 90_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const s = await get();
    if (done(s)) return s;
    if (Date.now() > until) throw new Error(`surface still ${s.status} after ${timeoutMs} ms: ${JSON.stringify(s).slice(0, 600)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/**
 * Stores a run directly (no runner): with `status: 'succeeded'` it is computed in-process and its
 * raster and contours are stored as the runner would.
 * @param ds the app
 * @param ids organization, workspace, customer file
 * @param points the file's points
 * @param status the run's status
 * @param params surface parameters (parsed with defaults)
 * @returns the run id
 * @example
 * const id = await surfaceStored(ds, { orgId, wsId, fileId }, points, 'succeeded');
 */
export async function surfaceStored(
  ds: Pick<DemandscapeApp, 'orm'>,
  ids: { orgId: string; wsId: string; fileId: string },
  points: { lon: Float64Array; lat: Float64Array; w: Float64Array; count: number },
  status: 'queued' | 'succeeded' | 'cancelled' | 'failed',
  params: object = { kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 } },
): Promise<string> {
  const parsed = surfaceParamsSchema.parse(params);
  const em = ds.orm.em.fork();
  const id = randomUUID();
  const now = new Date();
  const r = status === 'succeeded' ? surfaceCompute(points.lon, points.lat, points.w, parsed) : null;
  em.create(SurfaceSchema, {
    id,
    organization: ids.orgId,
    workspace: ids.wsId,
    customerFileId: ids.fileId,
    name: `Stored ${status}`,
    status,
    progress: r ? 1 : 0,
    params: parsed,
    resolved: r?.resolved ?? null,
    engineVersion: '0.1.0',
    attempts: r ? 1 : 0,
    queuedAt: now,
    finishedAt: status === 'queued' ? null : now,
    stats: r?.stats ?? null,
    thresholds: r?.thresholds ?? null,
    timings: r?.timings ?? null,
    error: status === 'failed' ? { code: 'ENGINE_ERROR', message: 'stored as failed' } : null,
    pointCount: points.count,
    costCredits: 1,
    creditRef: null,
    createdBy: null,
  } as never);
  if (r) {
    em.create(SurfaceRasterSchema, {
      id: randomUUID(),
      surface: id,
      kind: 'intensity',
      width: r.width,
      height: r.height,
      data: Buffer.from(r.raster.buffer, r.raster.byteOffset, r.raster.byteLength),
      contours: r.contours,
    } as never);
  }
  await em.flush();
  return id;
}

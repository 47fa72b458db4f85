import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';
import type { SurfaceParams } from './surface.schemas.js';

export const SURFACE_STATUSES = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type SurfaceStatus = (typeof SURFACE_STATUSES)[number];

/** What the run actually used (bandwidth value and rule, cell size, grid, projection, method). */
export interface SurfaceResolved {
  bandwidth: { value: number; rule: string; explanation: string; gaussianSd: number; radius: number; kernelSd: number };
  cellSize: { value: number; explanation: string };
  grid: { originX: number; originY: number; cellSize: number; width: number; height: number };
  projection: { kind: 'utm' | 'laea'; epsg: number | null; proj4: string; label: string };
  method: 'exact' | 'binned';
}

/** One percent-volume level: the area holding `percent` % of the demand above `threshold` (per km²). */
export interface SurfaceThreshold {
  percent: number;
  threshold: number;
  areaKm2: number;
  clipped: boolean;
}

/**
 * One demand-surface run (a row is the job: queued → running → succeeded | failed | cancelled).
 * `customerFile` is set null when the file is deleted; results stay.
 */
export interface Surface extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  customerFileId: string | null;
  name: string;
  status: SurfaceStatus;
  /** 0–1. */
  progress: number;
  params: SurfaceParams;
  resolved: SurfaceResolved | null;
  engineVersion: string;
  attempts: number;
  /** Runner instance that claimed the run, and its last heartbeat (crash recovery). */
  claimedBy: string | null;
  heartbeatAt: Date | null;
  queuedAt: Date;
  startedAt: Date | null;
  finishedAt: Date | null;
  /** Seconds per stage of the last attempt. */
  timings: Record<string, number> | null;
  error: { code: string; message: string } | null;
  stats: Record<string, unknown> | null;
  thresholds: SurfaceThreshold[] | null;
  pointCount: number;
  costCredits: number;
  /** Ledger ref of the current credit reservation (a new one per queueing). */
  creditRef: string | null;
  createdBy: User | null;
}

export const SurfaceSchema = new EntitySchema<Surface>({
  name: 'Surface',
  tableName: 'surfaces',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade' },
    // A plain column (not a relation) so this module does not depend on the customer-file entity;
    // the foreign key (on delete set null) is in the migration.
    customerFileId: { type: 'string', length: 36, nullable: true, fieldName: 'customer_file_id' },
    name: { type: 'string', length: 120 },
    status: { type: 'string', length: 16 },
    progress: { type: 'double', default: 0 },
    params: { type: 'json' },
    resolved: { type: 'json', nullable: true },
    engineVersion: { type: 'string', length: 32 },
    attempts: { type: 'integer', default: 0 },
    claimedBy: { type: 'string', length: 64, nullable: true },
    heartbeatAt: { type: 'Date', nullable: true },
    queuedAt: { type: 'Date' },
    startedAt: { type: 'Date', nullable: true },
    finishedAt: { type: 'Date', nullable: true },
    timings: { type: 'json', nullable: true },
    error: { type: 'json', nullable: true },
    stats: { type: 'json', nullable: true },
    thresholds: { type: 'json', nullable: true },
    pointCount: { type: 'integer', default: 0 },
    costCredits: { type: 'integer', default: 0 },
    creditRef: { type: 'string', length: 80, nullable: true },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

/** A result raster: Float32 little-endian, row-major, j = 0 south, weight per km²; NaN outside the study area. */
export interface SurfaceRaster extends BaseEntity {
  surface: Surface;
  kind: 'intensity';
  width: number;
  height: number;
  data: Buffer;
  /** Percent-volume contours in lon/lat (GeoJSON FeatureCollection). */
  contours: Record<string, unknown>;
}

export const SurfaceRasterSchema = new EntitySchema<SurfaceRaster>({
  name: 'SurfaceRaster',
  tableName: 'surface_rasters',
  properties: {
    ...baseProperties(),
    surface: { kind: 'm:1', entity: 'Surface', deleteRule: 'cascade' },
    kind: { type: 'string', length: 16 },
    width: { type: 'integer' },
    height: { type: 'integer' },
    data: { type: 'blob', lazy: true },
    contours: { type: 'json', lazy: true },
  },
});

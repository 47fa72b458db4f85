import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';

export const CUSTOMER_FILE_STATUSES = [
  'awaiting-mapping',
  'importing',
  'imported',
  'failed',
] as const;
export type CustomerFileStatus = (typeof CUSTOMER_FILE_STATUSES)[number];
export const WEIGHT_KINDS = ['count', 'spend', 'visits', 'other'] as const;
export type WeightKind = (typeof WEIGHT_KINDS)[number];

/** Which column holds what; names are the file's own header texts. */
export interface ColumnMapping {
  lon: string;
  lat: string;
  weight?: string;
}

/** What the upload step found in the file (no cell values, only its shape). */
export interface CustomerFileDetected {
  columns: string[];
  /** False when the first line held only numbers: columns are then named "column 1", "column 2", … */
  hasHeader: boolean;
  delimiter: string | null;
  decimalComma: boolean;
  encoding: 'utf-8' | 'utf-8-bom' | 'latin1';
  /** CSV without quotes and with `\n` line ends: read by plain splitting (faster); else the full parser. */
  simpleLines?: boolean;
  /** Auto-detected columns; the analyst confirms or changes them at import. */
  suggested: Partial<ColumnMapping>;
  /** Name of the worksheet read (XLSX only: the first one). */
  sheet?: string;
}

/** Validation outcome: counts per reason plus a few example rows (row number + mapped raw text only). */
export interface CustomerFileReport {
  rejected: Record<string, number>;
  flagged: Record<string, number>;
  examples: Record<string, { row: number; lon: string; lat: string; weight?: string }[]>;
  /** The outlier rule as applied (centre, spread and distance limit in metres). */
  outlierRule?: {
    centerLon: number;
    centerLat: number;
    spreadM: number;
    limitM: number;
    applied: boolean;
    note: string;
  };
}

/** An uploaded customer file and, after import, its validation report. */
export interface CustomerFile extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  name: string;
  sizeBytes: number;
  format: 'csv' | 'xlsx';
  status: CustomerFileStatus;
  error: { code: string; message: string } | null;
  detected: CustomerFileDetected;
  mapping: ColumnMapping | null;
  weightKind: WeightKind | null;
  weightLabel: string | null;
  excludeFlagged: boolean;
  rowCount: number;
  acceptedCount: number;
  rejectedCount: number;
  flaggedCount: number;
  excludedCount: number;
  report: CustomerFileReport | null;
  bbox: [number, number, number, number] | null;
  totalWeight: number;
  /** Random file name under UPLOADS_DIR while the raw upload is kept; null once discarded. */
  storedName: string | null;
  /** gzip of the rejected-rows CSV (row, reason, mapped raw text only); loaded only on demand. */
  rejectedCsv: Buffer | null;
  createdBy: User | null;
  importedAt: Date | null;
}

export const CustomerFileSchema = new EntitySchema<CustomerFile>({
  name: 'CustomerFile',
  tableName: 'customer_files',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade' },
    name: { type: 'string', length: 255 },
    sizeBytes: { type: 'integer' },
    format: { type: 'string', length: 8 },
    status: { type: 'string', length: 20 },
    error: { type: 'json', nullable: true },
    detected: { type: 'json' },
    mapping: { type: 'json', nullable: true },
    weightKind: { type: 'string', length: 10, nullable: true },
    weightLabel: { type: 'string', length: 120, nullable: true },
    excludeFlagged: { type: 'boolean', default: false },
    rowCount: { type: 'integer', default: 0 },
    acceptedCount: { type: 'integer', default: 0 },
    rejectedCount: { type: 'integer', default: 0 },
    flaggedCount: { type: 'integer', default: 0 },
    excludedCount: { type: 'integer', default: 0 },
    report: { type: 'json', nullable: true },
    bbox: { type: 'json', nullable: true },
    totalWeight: { type: 'double', default: 0 },
    storedName: { type: 'string', length: 64, nullable: true },
    rejectedCsv: { type: 'blob', nullable: true, lazy: true },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
    importedAt: { type: 'Date', nullable: true },
  },
});

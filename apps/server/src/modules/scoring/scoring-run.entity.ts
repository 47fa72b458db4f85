import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';
import type { RunSiteJson, ScoringResultsJson, ScoringRunJson, ScoringRunStatus, ScoringSettingsJson, SiteSetJson, StabilityJson } from './scoring.types.js';

/**
 * One scoring run (the row is the job: queued → running → succeeded | failed). Settings, sites
 * and surface facts are snapshots, so later edits or deletes of sites and surfaces leave a
 * finished run as it was; `surfaceId` is set null when the surface is deleted (`surfaceName` stays).
 */
export interface ScoringRun extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  /** A plain column (the foreign key, on delete set null, is in the migration). */
  surfaceId: string | null;
  surfaceName: string;
  name: string;
  status: ScoringRunStatus;
  /** 0–1. */
  progress: number;
  settings: ScoringSettingsJson & { radiiM: number[] };
  sites: RunSiteJson[];
  surfaceInfo: ScoringRunJson['surface'];
  weightLabel: string;
  candidateCount: number;
  results: ScoringResultsJson | null;
  stability: StabilityJson | null;
  sets: SiteSetJson[];
  warnings: string[];
  error: { code: string; message: string } | null;
  timings: Record<string, number> | null;
  /** Process that computes the run (or its stability) and its last sign of life (restart recovery). */
  claimedBy: string | null;
  heartbeatAt: Date | null;
  startedAt: Date | null;
  finishedAt: Date | null;
  createdBy: User | null;
}

export const ScoringRunSchema = new EntitySchema<ScoringRun>({
  name: 'ScoringRun',
  tableName: 'scoring_runs',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade' },
    surfaceId: { type: 'string', length: 36, nullable: true, fieldName: 'surface_id' },
    surfaceName: { type: 'string', length: 120 },
    name: { type: 'string', length: 120 },
    status: { type: 'string', length: 16 },
    progress: { type: 'double', default: 0 },
    settings: { type: 'json' },
    sites: { type: 'json', lazy: true },
    surfaceInfo: { type: 'json' },
    weightLabel: { type: 'string', length: 120 },
    candidateCount: { type: 'integer', default: 0 },
    results: { type: 'json', nullable: true, lazy: true },
    stability: { type: 'json', nullable: true },
    sets: { type: 'json' },
    warnings: { type: 'json' },
    error: { type: 'json', nullable: true },
    timings: { type: 'json', nullable: true },
    claimedBy: { type: 'string', length: 64, nullable: true },
    heartbeatAt: { type: 'Date', nullable: true },
    startedAt: { type: 'Date', nullable: true },
    finishedAt: { type: 'Date', nullable: true },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

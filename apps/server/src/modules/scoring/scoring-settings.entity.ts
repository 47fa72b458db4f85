import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';
import type { ScoringMeasure } from './scoring.types.js';

/** A workspace's saved trade-area rules (one row per workspace; none until a planner saves). */
export interface ScoringSettings extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  alpha: number;
  beta: number;
  /** Ring radii in `radiusUnit`, ascending. */
  radii: number[];
  radiusUnit: 'km' | 'mi';
  measure: ScoringMeasure;
  /** Metres; null = half a cell. */
  minDistanceM: number | null;
  updatedBy: User | null;
}

export const ScoringSettingsSchema = new EntitySchema<ScoringSettings>({
  name: 'ScoringSettings',
  tableName: 'scoring_settings',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade', unique: true },
    alpha: { type: 'double' },
    beta: { type: 'double' },
    radii: { type: 'json' },
    radiusUnit: { type: 'string', length: 4 },
    measure: { type: 'string', length: 32 },
    minDistanceM: { type: 'double', nullable: true },
    updatedBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

import { EntitySchema } from '@mikro-orm/core';
import type { SiteKind } from '@demandscape/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import type { Workspace } from '../workspace/workspace.entity.js';

/**
 * A candidate site, own store or competitor store of one workspace. `lon`/`lat` are WGS84
 * degrees; `attractiveness` (> 0) is the Huff model's A_j in the unit `attractivenessLabel` names.
 */
export interface Site extends BaseEntity {
  organization: Organization;
  workspace: Workspace;
  kind: SiteKind;
  name: string;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel: string;
  notes: string;
  createdBy: User | null;
}

export const SiteSchema = new EntitySchema<Site>({
  name: 'Site',
  tableName: 'sites',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    workspace: { kind: 'm:1', entity: 'Workspace', deleteRule: 'cascade' },
    kind: { type: 'string' },
    name: { type: 'string', length: 120 },
    lon: { type: 'double' },
    lat: { type: 'double' },
    attractiveness: { type: 'double' },
    attractivenessLabel: { type: 'string', default: '' },
    notes: { type: 'text', default: '' },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

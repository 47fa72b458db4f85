import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';

/** One site-selection study inside an organization. */
export interface Workspace extends BaseEntity {
  organization: Organization;
  name: string;
  description: string;
  createdBy: User | null;
}

export const WorkspaceSchema = new EntitySchema<Workspace>({
  name: 'Workspace',
  tableName: 'workspaces',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    name: { type: 'string', length: 120 },
    description: { type: 'text', default: '' },
    createdBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
  },
});

import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';

/** The tenancy boundary: every workspace, file and run belongs to one organization. */
export interface Organization extends BaseEntity {
  name: string;
  slug: string;
}

export const OrganizationSchema = new EntitySchema<Organization>({
  name: 'Organization',
  tableName: 'organizations',
  properties: {
    ...baseProperties(),
    name: { type: 'string', length: 120 },
    slug: { type: 'string', length: 140, unique: true },
  },
});

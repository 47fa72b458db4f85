import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Organization } from './organization.entity.js';
import type { User } from '../user/user.entity.js';

/** The four roles; rights per role are in PRODUCT.md and enforced by `requireMembership`. */
export const ROLES = ['owner', 'analyst', 'planner', 'executive'] as const;
export type Role = (typeof ROLES)[number];

/** A user's role in one organization. */
export interface Membership extends BaseEntity {
  organization: Organization;
  user: User;
  role: Role;
}

export const MembershipSchema = new EntitySchema<Membership>({
  name: 'Membership',
  tableName: 'memberships',
  uniques: [{ properties: ['organization', 'user'] }],
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    user: { kind: 'm:1', entity: 'User', deleteRule: 'cascade' },
    role: { type: 'string', length: 20 },
  },
});

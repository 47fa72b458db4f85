import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { Role } from '../organization/membership.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';

/** An e-mailed offer to join an organization with a role; only the SHA-256 of its token is stored. */
export interface Invitation extends BaseEntity {
  organization: Organization;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: User | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  acceptedBy: User | null;
  revokedAt: Date | null;
}

export const InvitationSchema = new EntitySchema<Invitation>({
  name: 'Invitation',
  tableName: 'invitations',
  properties: {
    ...baseProperties(),
    organization: { kind: 'm:1', entity: 'Organization', deleteRule: 'cascade' },
    email: { type: 'string' },
    role: { type: 'string' },
    tokenHash: { type: 'string', unique: true },
    invitedBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
    expiresAt: { type: 'Date' },
    acceptedAt: { type: 'Date', nullable: true },
    acceptedBy: { kind: 'm:1', entity: 'User', nullable: true, deleteRule: 'set null' },
    revokedAt: { type: 'Date', nullable: true },
  },
});

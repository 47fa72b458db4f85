import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';
import type { User } from '../user/user.entity.js';

export type AuthTokenPurpose = 'verify_email' | 'reset_password';

/** A one-use e-mailed token; only its SHA-256 hash is stored. */
export interface AuthToken extends BaseEntity {
  user: User;
  purpose: AuthTokenPurpose;
  tokenHash: string;
  expiresAt: Date;
  usedAt: Date | null;
}

export const AuthTokenSchema = new EntitySchema<AuthToken>({
  name: 'AuthToken',
  tableName: 'auth_tokens',
  properties: {
    ...baseProperties(),
    user: { kind: 'm:1', entity: 'User', deleteRule: 'cascade' },
    purpose: { type: 'string', length: 20 },
    tokenHash: { type: 'string', length: 64, unique: true },
    expiresAt: { type: 'Date' },
    usedAt: { type: 'Date', nullable: true },
  },
});

import { EntitySchema } from '@mikro-orm/core';
import { baseProperties, type BaseEntity } from '../common/base.entity.js';

/** A person who signs in. E-mail is stored lower-cased; `passwordHash` is null for Google-only accounts. */
export interface User extends BaseEntity {
  email: string;
  name: string;
  passwordHash: string | null;
  emailVerifiedAt: Date | null;
  googleSubject: string | null;
}

export const UserSchema = new EntitySchema<User>({
  name: 'User',
  tableName: 'users',
  properties: {
    ...baseProperties(),
    email: { type: 'string', length: 254, unique: true },
    name: { type: 'string', length: 120 },
    passwordHash: { type: 'string', nullable: true, hidden: true },
    emailVerifiedAt: { type: 'Date', nullable: true },
    googleSubject: { type: 'string', nullable: true, unique: true, hidden: true },
  },
});

/** Public shape of a user in API responses. */
export interface UserView {
  id: string;
  email: string;
  name: string;
  emailVerified: boolean;
  createdAt: string;
}

/**
 * The API view of a user (never includes hashes or provider ids).
 * @param user - the entity
 * @returns the `user` object of the API contract
 * @example
 * res.json({ user: userView(user) });
 */
export function userView(user: User): UserView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    emailVerified: user.emailVerifiedAt !== null,
    createdAt: user.createdAt.toISOString(),
  };
}

import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import { AuthTokenSchema, type AuthToken, type AuthTokenPurpose } from './auth-token.entity.js';
import { entityId } from '../common/base.entity.js';
import { TokenInvalidError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';

function tokenDigest(raw: string): string {
  return createHash('sha256').update(raw, 'utf8').digest('hex');
}

/**
 * Issues a one-use token for a user (queued in the unit of work; the caller flushes). Only the
 * SHA-256 hash is stored; the raw token goes into the e-mailed link.
 * @param em - entity manager
 * @param user - the owner of the token
 * @param purpose - 'verify_email' or 'reset_password'
 * @param ttlMs - validity in milliseconds
 * @returns the raw token (43 URL-safe characters, 256 random bits)
 * @example
 * const token = authTokenIssue(em, user, 'reset_password', 3600_000);
 */
export function authTokenIssue(em: EntityManager, user: User, purpose: AuthTokenPurpose, ttlMs: number): string {
  const raw = randomBytes(32).toString('base64url');
  em.create(AuthTokenSchema, { id: entityId(), user, purpose, tokenHash: tokenDigest(raw), expiresAt: new Date(Date.now() + ttlMs), usedAt: null } as AuthToken);
  return raw;
}

/**
 * Spends a one-use token: it must exist for this purpose, be unused and unexpired.
 * @param em - entity manager
 * @param raw - the token from the link
 * @param purpose - the expected purpose
 * @returns the token row (marked used; the caller flushes) with its user loaded
 * @throws TokenInvalidError otherwise
 * @example
 * const { user } = await authTokenConsume(em, body.token, 'verify_email');
 */
export async function authTokenConsume(em: EntityManager, raw: string, purpose: AuthTokenPurpose): Promise<AuthToken> {
  const digest = tokenDigest(raw);
  const row = await em.findOne(AuthTokenSchema, { tokenHash: digest }, { populate: ['user'] });
  const matches = row !== null && timingSafeEqual(Buffer.from(row.tokenHash, 'hex'), Buffer.from(digest, 'hex'));
  if (!row || !matches || row.purpose !== purpose || row.usedAt !== null || row.expiresAt.getTime() <= Date.now()) {
    throw new TokenInvalidError();
  }
  row.usedAt = new Date();
  return row;
}

/**
 * Invalidates a user's other unused tokens of one purpose (e.g. older reset links after a reset).
 * @param em - entity manager
 * @param userId - the user
 * @param purpose - which tokens
 * @returns the number invalidated
 * @example
 * await authTokenRevokeAll(em, user.id, 'reset_password');
 */
export function authTokenRevokeAll(em: EntityManager, userId: string, purpose: AuthTokenPurpose): Promise<number> {
  return em.nativeUpdate(AuthTokenSchema, { user: userId, purpose, usedAt: null }, { usedAt: new Date() });
}

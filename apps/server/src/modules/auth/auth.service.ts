import type { EntityManager } from '@mikro-orm/sqlite';
import { authTokenConsume, authTokenIssue, authTokenRevokeAll } from './auth-token.service.js';
import { passwordHash, passwordMatches } from './password-hash.js';
import { auditRecord } from '../audit/audit.service.js';
import { entityId } from '../common/base.entity.js';
import { ConflictError } from '../common/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { passwordResetMail, verificationMail } from '../mail/mail-templates.js';
import { UserSchema, type User } from '../user/user.entity.js';

const VERIFY_TTL_MS = 7 * 24 * 3600_000;
const RESET_TTL_MS = 3600_000;

/** What auth services need besides the entity manager. */
export interface AuthDeps {
  em: EntityManager;
  mailer: Mailer;
  publicUrl: string;
}

/**
 * Creates an account with a password and e-mails a verification link.
 * @param deps - entity manager, mailer, public URL
 * @param input - e-mail (lower-cased), password (≥ 10 chars), name
 * @returns the new user
 * @throws ConflictError EMAIL_TAKEN when the e-mail is registered
 * @example
 * const user = await authSignUp(deps, { email, password, name });
 */
export async function authSignUp(deps: AuthDeps, input: { email: string; password: string; name: string }): Promise<User> {
  const { em } = deps;
  if (await em.count(UserSchema, { email: input.email })) {
    throw new ConflictError('EMAIL_TAKEN', 'An account with this e-mail already exists. Sign in, or reset the password.', 'email');
  }
  const user = em.create(UserSchema, {
    id: entityId(),
    email: input.email,
    name: input.name,
    passwordHash: await passwordHash(input.password),
    emailVerifiedAt: null,
    googleSubject: null,
  } as User);
  const token = authTokenIssue(em, user, 'verify_email', VERIFY_TTL_MS);
  auditRecord(em, { action: 'auth.sign_up', actor: user, target: { type: 'user', id: user.id }, details: { method: 'password' } });
  await em.flush();
  await deps.mailer.send(verificationMail(user.email, user.name, `${deps.publicUrl}/verify-email?token=${token}`));
  return user;
}

/**
 * Checks e-mail and password; records `auth.sign_in_failed` on a mismatch.
 * @param em - entity manager
 * @param email - lower-cased e-mail
 * @param password - the attempt
 * @returns the user, or null (same timing whether or not the e-mail exists)
 * @example
 * const user = await authCredentialsCheck(em, email, password);
 */
export async function authCredentialsCheck(em: EntityManager, email: string, password: string): Promise<User | null> {
  const user = await em.findOne(UserSchema, { email });
  if (await passwordMatches(user?.passwordHash ?? null, password)) return user;
  auditRecord(em, { action: 'auth.sign_in_failed', actor: user, details: { method: 'password' } });
  await em.flush();
  return null;
}

/**
 * E-mails a password reset link (valid 1 h, one use) when the account exists; silent otherwise.
 * @param deps - entity manager, mailer, public URL
 * @param email - lower-cased e-mail
 * @returns nothing; the caller always answers 202
 * @example
 * await authPasswordForgot(deps, 'owner@larchloaf.example');
 */
export async function authPasswordForgot(deps: AuthDeps, email: string): Promise<void> {
  const user = await deps.em.findOne(UserSchema, { email });
  if (!user) return;
  const token = authTokenIssue(deps.em, user, 'reset_password', RESET_TTL_MS);
  await deps.em.flush();
  await deps.mailer.send(passwordResetMail(user.email, user.name, `${deps.publicUrl}/reset-password?token=${token}`));
}

/**
 * Sets a new password from a reset token; other reset links of the user stop working.
 * Resetting also proves the e-mail, so it is marked verified.
 * @param em - entity manager
 * @param token - raw token from the link
 * @param password - the new password
 * @returns the user (the caller signs out their sessions)
 * @throws TokenInvalidError when the token is unknown, used or expired
 * @example
 * const user = await authPasswordReset(em, token, 'a new long password');
 */
export async function authPasswordReset(em: EntityManager, token: string, password: string): Promise<User> {
  const row = await authTokenConsume(em, token, 'reset_password');
  const user = row.user;
  user.passwordHash = await passwordHash(password);
  user.emailVerifiedAt ??= new Date();
  auditRecord(em, { action: 'auth.password_reset', actor: user, target: { type: 'user', id: user.id } });
  await em.flush();
  await authTokenRevokeAll(em, user.id, 'reset_password');
  return user;
}

/**
 * Marks the e-mail of the token's user as verified.
 * @param em - entity manager
 * @param token - raw token from the link
 * @returns the user
 * @throws TokenInvalidError when the token is unknown, used or expired
 * @example
 * await authEmailVerify(em, token);
 */
export async function authEmailVerify(em: EntityManager, token: string): Promise<User> {
  const row = await authTokenConsume(em, token, 'verify_email');
  row.user.emailVerifiedAt ??= new Date();
  await em.flush();
  return row.user;
}

/**
 * Sends a fresh verification link (no-op when already verified).
 * @param deps - entity manager, mailer, public URL
 * @param user - the signed-in user
 * @returns nothing
 * @example
 * await authVerificationResend(deps, req.user);
 */
export async function authVerificationResend(deps: AuthDeps, user: User): Promise<void> {
  const fresh = await deps.em.findOneOrFail(UserSchema, { id: user.id });
  if (fresh.emailVerifiedAt) return;
  const token = authTokenIssue(deps.em, fresh, 'verify_email', VERIFY_TTL_MS);
  await deps.em.flush();
  await deps.mailer.send(verificationMail(fresh.email, fresh.name, `${deps.publicUrl}/verify-email?token=${token}`));
}

/** The parts of a Google profile we use. */
export interface GoogleIdentity {
  subject: string;
  email: string | null;
  emailVerified: boolean;
  name: string;
}

/**
 * Finds, links or creates the user for a Google identity. Linking and creating need an e-mail
 * that Google marks verified, so nobody can take over an account through an unverified address.
 * @param em - entity manager
 * @param identity - subject, e-mail, verified flag, name
 * @returns the user, or null when the identity cannot be used
 * @example
 * const user = await authGoogleUser(em, { subject: '123', email: 'a@b.example', emailVerified: true, name: 'A' });
 */
export async function authGoogleUser(em: EntityManager, identity: GoogleIdentity): Promise<User | null> {
  const known = await em.findOne(UserSchema, { googleSubject: identity.subject });
  if (known) return known;
  if (!identity.email || !identity.emailVerified) return null;
  const email = identity.email.trim().toLowerCase();
  const existing = await em.findOne(UserSchema, { email });
  if (existing) {
    existing.googleSubject = identity.subject;
    existing.emailVerifiedAt ??= new Date();
    await em.flush();
    return existing;
  }
  const user = em.create(UserSchema, {
    id: entityId(),
    email,
    name: identity.name.trim().slice(0, 120) || email.split('@')[0],
    passwordHash: null,
    emailVerifiedAt: new Date(),
    googleSubject: identity.subject,
  } as User);
  auditRecord(em, { action: 'auth.sign_up', actor: user, target: { type: 'user', id: user.id }, details: { method: 'google' } });
  await em.flush();
  return user;
}

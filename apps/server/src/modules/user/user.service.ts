import type { EntityManager } from '@mikro-orm/sqlite';
import { UserSchema, userView, type UserView } from './user.entity.js';
import { MembershipSchema, type Role } from '../organization/membership.entity.js';
import { ValidationError } from '../common/errors.js';
import { passwordHash, passwordMatches } from '../auth/password-hash.js';

/** `GET /api/me` response. */
export interface MeView {
  user: UserView;
  memberships: { organization: { id: string; name: string; slug: string }; role: Role }[];
}

/**
 * The signed-in user with their memberships, organizations sorted by name.
 * @param em - entity manager
 * @param userId - the user
 * @returns user and memberships
 * @example
 * res.json(await meView(em, req.user.id));
 */
export async function meView(em: EntityManager, userId: string): Promise<MeView> {
  const user = await em.findOneOrFail(UserSchema, { id: userId });
  const memberships = await em.find(MembershipSchema, { user: userId }, { populate: ['organization'], orderBy: { organization: { name: 'asc' } } });
  return {
    user: userView(user),
    memberships: memberships.map((m) => ({ organization: { id: m.organization.id, name: m.organization.name, slug: m.organization.slug }, role: m.role })),
  };
}

/**
 * Renames the user.
 * @param em - entity manager
 * @param userId - the user
 * @param name - new display name
 * @returns the updated user view
 * @example
 * await meRename(em, user.id, 'Ada Larch');
 */
export async function meRename(em: EntityManager, userId: string, name: string): Promise<UserView> {
  const user = await em.findOneOrFail(UserSchema, { id: userId });
  user.name = name;
  await em.flush();
  return userView(user);
}

/**
 * Changes the password after checking the current one.
 * @param em - entity manager
 * @param userId - the user
 * @param currentPassword - must match the stored password
 * @param newPassword - at least 10 characters
 * @returns nothing; the caller signs out the user's other sessions
 * @throws ValidationError on currentPassword when it does not match or no password is set
 * @example
 * await mePasswordChange(em, user.id, 'old password', 'a new password');
 */
export async function mePasswordChange(em: EntityManager, userId: string, currentPassword: string, newPassword: string): Promise<void> {
  const user = await em.findOneOrFail(UserSchema, { id: userId });
  if (!user.passwordHash) {
    throw new ValidationError('This account signs in with Google and has no password yet; use "Forgot password" to set one.', 'currentPassword');
  }
  if (!(await passwordMatches(user.passwordHash, currentPassword))) {
    throw new ValidationError('currentPassword: is incorrect', 'currentPassword', { currentPassword: 'is incorrect' });
  }
  user.passwordHash = await passwordHash(newPassword);
  await em.flush();
}

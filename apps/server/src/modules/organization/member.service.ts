import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { ConflictError, NotFoundError } from '../common/errors.js';
import type { User } from '../user/user.entity.js';
import { MembershipSchema, type Membership, type Role } from './membership.entity.js';
import type { Organization } from './organization.entity.js';

async function membershipOfOrg(em: EntityManager, organizationId: string, userId: string): Promise<Membership> {
  const membership = await em.findOne(MembershipSchema, { organization: organizationId, user: userId }, { populate: ['user'] });
  if (!membership) throw new NotFoundError('Member');
  return membership;
}

async function lastOwnerGuard(em: EntityManager, membership: Membership, orgName: string, doing: string): Promise<void> {
  if (membership.role !== 'owner') return;
  const owners = await em.count(MembershipSchema, { organization: membership.organization.id, role: 'owner' });
  if (owners <= 1) {
    throw new ConflictError('LAST_OWNER', `${membership.user.name} is the last owner of ${orgName}, so they cannot be ${doing} — make another member owner first.`);
  }
}

/**
 * Changes a member's role; the last owner cannot be demoted. Check and change share a transaction,
 * so two owners demoting each other at once cannot leave the organization without one.
 * @param em - entity manager
 * @param org - the organization
 * @param actor - the owner making the change
 * @param userId - the member
 * @param role - the new role
 * @returns the member as listed by `GET …/members`
 * @throws ConflictError LAST_OWNER; NotFoundError when not a member
 * @example
 * await memberRoleChange(em, org, owner, userId, 'planner');
 */
export async function memberRoleChange(em: EntityManager, org: Organization, actor: User, userId: string, role: Role) {
  return em.transactional(async (tem) => {
    const membership = await membershipOfOrg(tem, org.id, userId);
    const previous = membership.role;
    if (previous !== role) {
      if (role !== 'owner') await lastOwnerGuard(tem, membership, org.name, 'demoted');
      membership.role = role;
      auditRecord(tem, { action: 'member.role_change', organizationId: org.id, actor: tem.getReference('User', actor.id) as User, target: { type: 'user', id: userId }, details: { from: previous, to: role } });
    }
    const u = membership.user;
    return { userId: u.id, name: u.name, email: u.email, role: membership.role, joinedAt: new Date(membership.createdAt).toISOString() };
  });
}

/**
 * Removes a member (their seat becomes free); the last owner cannot be removed.
 * @param em - entity manager
 * @param org - the organization
 * @param actor - the owner
 * @param userId - the member
 * @returns nothing
 * @throws ConflictError LAST_OWNER; NotFoundError when not a member
 * @example
 * await memberRemove(em, org, owner, userId);
 */
export async function memberRemove(em: EntityManager, org: Organization, actor: User, userId: string): Promise<void> {
  await em.transactional(async (tem) => {
    const membership = await membershipOfOrg(tem, org.id, userId);
    await lastOwnerGuard(tem, membership, org.name, 'removed');
    auditRecord(tem, { action: 'member.remove', organizationId: org.id, actor: tem.getReference('User', actor.id) as User, target: { type: 'user', id: userId }, details: { role: membership.role } });
    tem.remove(membership);
  });
}

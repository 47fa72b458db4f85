import { randomBytes } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import { OrganizationSchema, type Organization } from './organization.entity.js';
import { MembershipSchema, type Membership, type Role } from './membership.entity.js';
import { auditRecord } from '../audit/audit.service.js';
import { WELCOME_CREDITS } from '../billing/billing-plans.js';
import { creditsGrant } from '../billing/credits.service.js';
import { entityId } from '../common/base.entity.js';
import type { User } from '../user/user.entity.js';

/** An organization as the API returns it. */
export interface OrganizationView {
  id: string;
  name: string;
  slug: string;
  createdAt: string;
}

/**
 * The API view of an organization.
 * @param org - the entity
 * @returns id, name, slug, createdAt
 * @example
 * res.json({ organization: organizationView(org) });
 */
export function organizationView(org: Organization): OrganizationView {
  return { id: org.id, name: org.name, slug: org.slug, createdAt: org.createdAt.toISOString() };
}

/**
 * A URL-friendly slug from a name ("Larchloaf Bakery-Cafés" → "larchloaf-bakery-cafes").
 * @param name - organization name
 * @returns lower-case ASCII words joined by hyphens ("organization" when nothing is left)
 * @example
 * organizationSlug('Larchloaf Bakery-Cafés'); // 'larchloaf-bakery-cafes'
 */
export function organizationSlug(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return slug || 'organization';
}

/**
 * Organizations the user belongs to, with their role, sorted by name.
 * @param em - entity manager
 * @param userId - the user
 * @returns organizations with role
 * @example
 * const list = await organizationsOfUser(em, user.id);
 */
export async function organizationsOfUser(em: EntityManager, userId: string): Promise<(OrganizationView & { role: Role })[]> {
  const memberships = await em.find(MembershipSchema, { user: userId }, { populate: ['organization'], orderBy: { organization: { name: 'asc' } } });
  return memberships.map((m) => ({ ...organizationView(m.organization), role: m.role }));
}

/**
 * Creates an organization with the creator as owner.
 * @param em - entity manager
 * @param creator - becomes owner
 * @param name - organization name
 * @returns the organization
 * @example
 * const org = await organizationCreate(em, user, 'Larchloaf Bakery-Cafés');
 */
export async function organizationCreate(em: EntityManager, creator: User, name: string): Promise<Organization> {
  const base = organizationSlug(name);
  let slug = base;
  while (await em.count(OrganizationSchema, { slug })) slug = `${base}-${randomBytes(3).toString('hex')}`;
  const org = em.create(OrganizationSchema, { id: entityId(), name, slug } as Organization);
  em.create(MembershipSchema, { id: entityId(), organization: org, user: em.getReference('User', creator.id), role: 'owner' } as Membership);
  auditRecord(em, { action: 'organization.create', organizationId: org.id, actor: creator, target: { type: 'organization', id: org.id }, details: { name } });
  await em.flush();
  await creditsGrant(em, org.id, WELCOME_CREDITS, 'welcome', 'Welcome credits for a new organization');
  return org;
}

/**
 * Renames an organization (the slug stays, so links keep working).
 * @param em - entity manager
 * @param org - the organization (loaded by the membership guard)
 * @param actor - who renames
 * @param name - new name
 * @returns the organization
 * @example
 * await organizationRename(em, req.membership.organization, user, 'Larchloaf Cafés');
 */
export async function organizationRename(em: EntityManager, org: Organization, actor: User, name: string): Promise<Organization> {
  const previous = org.name;
  org.name = name;
  auditRecord(em, { action: 'organization.rename', organizationId: org.id, actor, target: { type: 'organization', id: org.id }, details: { from: previous, to: name } });
  await em.flush();
  return org;
}

/**
 * Members of an organization, sorted by name.
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns members with role and join time
 * @example
 * const members = await organizationMembers(em, orgId);
 */
export async function organizationMembers(em: EntityManager, organizationId: string) {
  const memberships = await em.find(MembershipSchema, { organization: organizationId }, { populate: ['user'], orderBy: { user: { name: 'asc' } } });
  return memberships.map((m) => ({ userId: m.user.id, name: m.user.name, email: m.user.email, role: m.role, joinedAt: m.createdAt.toISOString() }));
}

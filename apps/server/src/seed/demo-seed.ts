import type { EntityManager, MikroORM } from '@mikro-orm/sqlite';
import { passwordHash } from '../modules/auth/password-hash.js';
import { billingDemoSetup } from '../modules/billing/billing-notify.js';
import { entityId } from '../modules/common/base.entity.js';
import { MembershipSchema, type Membership, type Role } from '../modules/organization/membership.entity.js';
import { OrganizationSchema, type Organization } from '../modules/organization/organization.entity.js';
import { UserSchema, type User } from '../modules/user/user.entity.js';
import { WorkspaceSchema, type Workspace } from '../modules/workspace/workspace.entity.js';
import { DEMO_CUSTOMER_FILE_NAME, demoCustomerFileSeed } from './demo-customer-file.js';
import { DEMO_SITES, demoSitesSeed } from './demo-sites.js';
import { DEMO_SURFACE_NAME, demoSurfaceQueue } from './demo-surface.js';

/** The one password of every demo account (invented data; never use it for anything real). */
export const DEMO_PASSWORD = 'larchloaf-demo-2027';

/** Invented demo people, one per role, on an RFC 2606 `.example` domain. */
export const DEMO_USERS: { role: Role; email: string; name: string }[] = [
  { role: 'owner', email: 'owner@larchloaf.example', name: 'Maren Larchwood' },
  { role: 'analyst', email: 'analyst@larchloaf.example', name: 'Tobiah Crane' },
  { role: 'planner', email: 'planner@larchloaf.example', name: 'Ilse Dunmore' },
  { role: 'executive', email: 'executive@larchloaf.example', name: 'Odile Fairhaven' },
];

export const DEMO_ORGANIZATION = { name: 'Larchloaf Bakery-Cafés', slug: 'larchloaf-bakery-cafes' };
export const DEMO_WORKSPACE = {
  name: 'Quillport north corridor 2027',
  description: 'Where should Larchloaf open its seventh café? Eight candidate sites along the north corridor of Quillport, weighed against three competitor chains. (Invented demo data.)',
};

/** What the demo customer file needs: the ORM (the import forks its own entity manager) and UPLOADS_DIR. */
export interface DemoSeedImport {
  orm: MikroORM;
  uploadsDir: string;
}

/**
 * Creates the invented demo organization, its workspace with the invented demo sites (own stores,
 * candidates, competitors) and one user per role; with `imports`,
 * also the invented demo customer file (uploaded and imported by the demo analyst) and one queued
 * demand surface on it, when the workspace has no customer file yet. Idempotent: what exists is left as it is (passwords of
 * existing demo users are not reset).
 * @param em - entity manager (a fork)
 * @param imports - ORM and uploads folder for the demo customer file (left out: no customer file)
 * @returns what was created this time
 * @example
 * const { created } = await demoSeed(orm.em.fork(), { orm, uploadsDir: config.uploadsDir });
 */
export async function demoSeed(
  em: EntityManager,
  imports?: DemoSeedImport,
): Promise<{ created: string[]; organizationId: string; workspaceId: string }> {
  const created: string[] = [];
  let org = await em.findOne(OrganizationSchema, { slug: DEMO_ORGANIZATION.slug });
  if (!org) {
    org = em.create(OrganizationSchema, { id: entityId(), ...DEMO_ORGANIZATION } as Organization);
    created.push(`organization ${DEMO_ORGANIZATION.name}`);
  }
  const hash = await passwordHash(DEMO_PASSWORD);
  let owner: User | null = null;
  let analyst: User | null = null;
  let planner: User | null = null;
  for (const demo of DEMO_USERS) {
    let user = await em.findOne(UserSchema, { email: demo.email });
    if (!user) {
      user = em.create(UserSchema, { id: entityId(), email: demo.email, name: demo.name, passwordHash: hash, emailVerifiedAt: new Date(), googleSubject: null } as User);
      created.push(`user ${demo.email}`);
    }
    if (demo.role === 'owner') owner = user;
    if (demo.role === 'analyst') analyst = user;
    if (demo.role === 'planner') planner = user;
    const membership = await em.findOne(MembershipSchema, { organization: org.id, user: user.id });
    if (!membership) {
      em.create(MembershipSchema, { id: entityId(), organization: org, user, role: demo.role } as Membership);
      created.push(`${demo.role} membership`);
    }
  }
  let workspace = await em.findOne(WorkspaceSchema, { organization: org.id, name: DEMO_WORKSPACE.name });
  if (!workspace) {
    workspace = em.create(WorkspaceSchema, { id: entityId(), organization: org, ...DEMO_WORKSPACE, createdBy: owner } as Workspace);
    created.push(`workspace ${DEMO_WORKSPACE.name}`);
  }
  await em.flush();
  await billingDemoSetup(em, org.id);
  if (planner && (await demoSitesSeed(em, { organizationId: org.id, workspaceId: workspace.id }, planner)) > 0) {
    created.push(`${DEMO_SITES.length} demo sites`);
  }
  if (imports && analyst) {
    const scope = { organizationId: org.id, workspaceId: workspace.id };
    const fileId = await demoCustomerFileSeed(em, imports.orm, imports.uploadsDir, scope, analyst);
    if (fileId) {
      created.push(`customer file ${DEMO_CUSTOMER_FILE_NAME}`);
      await demoSurfaceQueue(em, scope, analyst, fileId);
      created.push(`queued surface ${DEMO_SURFACE_NAME}`);
    }
  }
  return { created, organizationId: org.id, workspaceId: workspace.id };
}

import type { AuditEvent, Me, Member, OrganizationSummary, Role, User, Workspace } from '../types/api';

let counter = 0;
const nextId = (prefix: string) => `${prefix}_${(++counter).toString(36).padStart(4, '0')}`;

/**
 * A user as the API returns it (invented Larchloaf staff).
 * @param overrides fields to set
 * @returns the user
 * @example createUser({ emailVerified: false })
 */
export function createUser(overrides: Partial<User> = {}): User {
  return {
    id: nextId('usr'),
    email: `planner${counter}@larchloaf.test`,
    name: 'Wren Applegarth',
    emailVerified: true,
    createdAt: '2026-11-02T09:30:00.000Z',
    ...overrides,
  };
}

/**
 * An organization with the viewer's role in it.
 * @param overrides fields to set
 * @returns the organization summary
 * @example createOrganization({ role: 'executive' })
 */
export function createOrganization(overrides: Partial<OrganizationSummary> = {}): OrganizationSummary {
  const id = overrides.id ?? nextId('org');
  return { id, name: 'Larchloaf', slug: 'larchloaf', role: 'owner', createdAt: '2026-11-02T09:31:00.000Z', ...overrides };
}

/**
 * A `/api/me` answer with one membership per organization given.
 * @param organizations the user's organizations (with roles)
 * @param user fields to set on the user
 * @returns the session
 * @example createMe([createOrganization({ role: 'planner' })])
 */
export function createMe(organizations: OrganizationSummary[] = [createOrganization()], user: Partial<User> = {}): Me {
  return {
    user: createUser(user),
    memberships: organizations.map(({ id, name, slug, role }) => ({ organization: { id, name, slug }, role })),
  };
}

/**
 * A workspace.
 * @param overrides fields to set
 * @returns the workspace
 * @example createWorkspace({ name: 'Harbour front 2027' })
 */
export function createWorkspace(overrides: Partial<Workspace> = {}): Workspace {
  return {
    id: nextId('wsp'),
    name: 'North corridor 2027',
    description: 'Where the seventh Larchloaf café should open in Quillport.',
    createdAt: '2026-11-03T10:00:00.000Z',
    updatedAt: '2026-11-04T16:20:00.000Z',
    createdBy: { id: 'usr_owner', name: 'Wren Applegarth' },
    ...overrides,
  };
}

/**
 * A member row.
 * @param role the member's role
 * @param overrides fields to set
 * @returns the member
 * @example createMember('analyst', { name: 'Tamsin Reedholm' })
 */
export function createMember(role: Role, overrides: Partial<Member> = {}): Member {
  return {
    userId: nextId('usr'),
    name: 'Tamsin Reedholm',
    email: `member${counter}@larchloaf.test`,
    role,
    joinedAt: '2026-11-05T08:00:00.000Z',
    ...overrides,
  };
}

/**
 * An audit event.
 * @param action the action code
 * @param overrides fields to set
 * @returns the event
 * @example createAuditEvent('workspace.create')
 */
export function createAuditEvent(action: string, overrides: Partial<AuditEvent> = {}): AuditEvent {
  return {
    id: nextId('evt'),
    action,
    actor: { id: 'usr_owner', name: 'Wren Applegarth', email: 'wren@larchloaf.test' },
    target: null,
    details: null,
    createdAt: '2026-11-05T08:00:00.000Z',
    ...overrides,
  };
}

import type { Role } from '../types/api';

/** What each role may do in an organization (PRODUCT.md rights table); the server enforces the same. */
const permissionRoles = {
  'audit-log:read': ['owner'],
  'organization:rename': ['owner'],
  /** Plan, seats, credit purchases, ledger and receipts. */
  'billing:manage': ['owner'],
  /** Invite people, change roles, remove members. */
  'members:manage': ['owner'],
  'members:read': ['owner', 'analyst', 'planner', 'executive'],
  'workspace:read': ['owner', 'analyst', 'planner', 'executive'],
  'workspace:create': ['owner', 'analyst', 'planner'],
  'workspace:update': ['owner', 'analyst', 'planner'],
  'workspace:delete': ['owner', 'analyst'],
  /** Aggregated customer bins on the map (never single points); executives and planners see surfaces only. */
  'customerPoints:read': ['owner', 'analyst'],
  /** Upload, map, import and delete customer files; download rejected rows. */
  'customerFile:write': ['owner', 'analyst'],
  /** Build demand surfaces (spends credits), cancel, retry and delete runs. */
  'surface:write': ['owner', 'analyst'],
  /** Save scoring settings, score sites, check rank stability, score candidate sets, delete scoring runs. */
  'scoring:write': ['owner', 'planner'],
  /** See the sites of a workspace (executives read shortlists instead; the server refuses them the sites list). */
  'site:read': ['owner', 'analyst', 'planner'],
  /** Add, import, edit, move and delete candidate sites, own stores and competitors. */
  'site:write': ['owner', 'planner'],
  /** Read shortlists and their exports (every role; the executive's page). */
  'shortlist:read': ['owner', 'analyst', 'planner', 'executive'],
  /** Build shortlists, save versions, rename, delete and share them with executives. */
  'shortlist:write': ['owner', 'planner'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionRoles;

/**
 * Whether a role may use a capability; the UI hides what the answer is no for.
 * @param role the member's role in the current organization
 * @param permission the capability
 * @returns true when allowed
 * @example roleCan('executive', 'workspace:create') // false
 */
export function roleCan(role: Role | undefined, permission: Permission): boolean {
  return role !== undefined && (permissionRoles[permission] as readonly Role[]).includes(role);
}

/** Plain-words label for each role, shown in badges and lists. */
export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  analyst: 'Analyst',
  planner: 'Planner',
  executive: 'Executive',
};

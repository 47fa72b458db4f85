import { ROLES, type Role } from '../organization/membership.entity.js';

/**
 * Which roles may do what, per organization (PRODUCT.md rights table). Routes pass one of these
 * lists to `requireMembership`; later features add their rows here.
 */
export const PERMISSIONS = {
  'organization.read': ROLES,
  'organization.rename': ['owner'],
  'members.read': ROLES,
  'audit.read': ['owner'],
  'workspace.read': ROLES,
  'workspace.create': ['owner', 'analyst', 'planner'],
  'workspace.update': ['owner', 'analyst', 'planner'],
  'workspace.delete': ['owner', 'analyst'],
  // Metadata and the validation report's counts only; never points or raw rows.
  'customerFile.read': ROLES,
  'customerFile.write': ['owner', 'analyst'],
  'customerPoints.read': ['owner', 'analyst'],
  'surface.read': ROLES,
  'surface.write': ['owner', 'analyst'],
  // Executives read shortlists, not the sites list.
  'site.read': ['owner', 'analyst', 'planner'],
  'site.write': ['owner', 'planner'],
  // Executives read rankings (aggregates only); owners and planners score.
  'scoring.read': ROLES,
  'scoring.write': ['owner', 'planner'],
  // Executives read and download shortlists; owners and planners build and share them.
  'shortlist.read': ROLES,
  'shortlist.write': ['owner', 'planner'],
  'billing.manage': ['owner'],
  'invitation.manage': ['owner'],
  'members.manage': ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

import type { RequestHandler } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { ForbiddenError, NotFoundError, UnauthenticatedError } from './errors.js';
import { MembershipSchema, type Role } from '../organization/membership.entity.js';
import type { User } from '../user/user.entity.js';
import '../../express-augment.js';

/**
 * 401 unless a user is signed in.
 * @returns express middleware
 * @example
 * router.get('/me', requireSession(), handler);
 */
export function requireSession(): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new UnauthenticatedError();
    next();
  };
}

/**
 * Loads the signed-in user's membership in `:orgId` into `req.membership`.
 * 401 when signed out, 404 when not a member (so other organizations' ids cannot be probed),
 * 403 when the role is not in `roles`.
 * @param em - entity manager (request-scoped through RequestContext)
 * @param roles - allowed roles; all members when omitted
 * @returns express middleware
 * @example
 * router.delete('/:orgId/workspaces/:workspaceId', requireMembership(em, PERMISSIONS['workspace.delete']), handler);
 */
export function requireMembership(em: EntityManager, roles?: readonly Role[]): RequestHandler {
  return async (req, _res, next) => {
    if (!req.user) throw new UnauthenticatedError();
    const orgId = String(req.params.orgId ?? '');
    const membership = await em.findOne(MembershipSchema, { organization: orgId, user: req.user.id }, { populate: ['organization'] });
    if (!membership) throw new NotFoundError('Organization');
    if (roles && !roles.includes(membership.role)) throw new ForbiddenError();
    req.membership = membership;
    next();
  };
}

/**
 * The signed-in user (after `requireSession`).
 * @param req - the request
 * @returns the user
 * @example
 * const user = sessionUser(req);
 */
export function sessionUser(req: { user?: User }): User {
  if (!req.user) throw new UnauthenticatedError();
  return req.user;
}

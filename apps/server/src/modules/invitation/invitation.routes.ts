import { Router } from 'express';
import { requireMembership, requireSession, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { invitationAcceptSchema, invitationCreateSchema } from './invitation.schemas.js';
import { invitationAccept, invitationCreate, invitationList, invitationPreview, invitationResend, invitationRevoke, type InvitationDeps } from './invitation.service.js';

/**
 * `/api/organizations/:orgId/invitations` (owners): list, invite, revoke, resend.
 * @param deps - entity manager, mailer, public URL
 * @returns the router (mount with `:orgId` in the path)
 * @example
 * app.use('/api/organizations/:orgId/invitations', invitationOrgRoutes(deps));
 */
export function invitationOrgRoutes(deps: InvitationDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMembership(deps.em, PERMISSIONS['invitation.manage']));

  router.get('/', async (req, res) => {
    res.json({ invitations: await invitationList(deps.em, req.membership!.organization.id) });
  });

  router.post('/', async (req, res) => {
    const input = inputParse(invitationCreateSchema, req.body);
    res.status(201).json({ invitation: await invitationCreate(deps, req.membership!.organization, sessionUser(req), input) });
  });

  router.delete('/:invitationId', async (req, res) => {
    await invitationRevoke(deps.em, req.membership!.organization, sessionUser(req), String(req.params.invitationId));
    res.status(204).end();
  });

  router.post('/:invitationId/resend', async (req, res) => {
    res.json({ invitation: await invitationResend(deps, req.membership!.organization, sessionUser(req), String(req.params.invitationId)) });
  });
  return router;
}

/**
 * `/api/invitations`: `GET /:token` (public preview) and `POST /accept` (signed in).
 * @param deps - entity manager
 * @returns the router
 * @example
 * app.use('/api/invitations', invitationPublicRoutes(deps));
 */
export function invitationPublicRoutes(deps: Pick<InvitationDeps, 'em'>): Router {
  const router = Router();
  router.post('/accept', requireSession(), async (req, res) => {
    const { token } = inputParse(invitationAcceptSchema, req.body);
    res.json(await invitationAccept(deps.em, sessionUser(req), token));
  });
  router.get('/:token', async (req, res) => {
    res.json(await invitationPreview(deps.em, String(req.params.token)));
  });
  return router;
}

import { Router } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import { meRename, mePasswordChange, meView } from './user.service.js';
import { meUpdateSchema, passwordChangeSchema } from './user.schemas.js';
import { requireSession, sessionUser } from '../common/guards.js';
import { inputParse } from '../common/validate.js';
import type { SqliteSessionStore } from '../session/session-store.js';

/**
 * `/api/me`: the signed-in user, rename, password change.
 * @param em - entity manager
 * @param sessionStore - to sign out other sessions after a password change
 * @returns the router
 * @example
 * app.use('/api/me', meRoutes(orm.em, store));
 */
export function meRoutes(em: EntityManager, sessionStore: SqliteSessionStore): Router {
  const router = Router();
  router.use(requireSession());

  router.get('/', async (req, res) => {
    res.json(await meView(em, sessionUser(req).id));
  });

  router.patch('/', async (req, res) => {
    const { name } = inputParse(meUpdateSchema, req.body);
    res.json({ user: await meRename(em, sessionUser(req).id, name) });
  });

  router.post('/password', async (req, res) => {
    const { currentPassword, newPassword } = inputParse(passwordChangeSchema, req.body);
    const user = sessionUser(req);
    await mePasswordChange(em, user.id, currentPassword, newPassword);
    await sessionStore.destroyForUser(user.id, req.sessionID);
    res.status(204).end();
  });

  return router;
}

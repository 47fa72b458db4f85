import { Router } from 'express';
import type { MikroORM } from '@mikro-orm/sqlite';

/**
 * `GET /api/health`: 200 with database 'ok', or 503 with database 'error' when SQLite does not answer.
 * @param orm - the ORM
 * @param version - server version string
 * @returns the router
 * @example
 * app.use('/api/health', healthRoutes(orm, '0.1.0'));
 */
export function healthRoutes(orm: MikroORM, version: string): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    let database: 'ok' | 'error' = 'ok';
    try {
      await orm.em.getConnection().execute('select 1');
    } catch {
      database = 'error';
    }
    res.status(database === 'ok' ? 200 : 503).json({ status: database === 'ok' ? 'ok' : 'degraded', version, database });
  });
  return router;
}

import { defineConfig } from '@mikro-orm/sqlite';
import { Migrator } from '@mikro-orm/migrations';
import { entities } from './entities.js';
import { migrationsList } from './migrations/index.js';

/**
 * MikroORM options for one SQLite database file (or ':memory:').
 * Every pooled connection gets foreign keys, WAL and a busy timeout; schema changes come only from migrations.
 * @param databaseFile - path to the SQLite file, or ':memory:'
 * @param logger - receives MikroORM's messages (migrations applied etc.)
 * @returns options for `MikroORM.init`
 * @example
 * const orm = await MikroORM.init(ormOptions('/srv/data/demandscape.sqlite'));
 */
export function ormOptions(databaseFile: string, logger: (message: string) => void = () => {}) {
  return defineConfig({
    dbName: databaseFile,
    entities,
    extensions: [Migrator],
    migrations: { migrationsList, transactional: true, allOrNothing: true, snapshot: false },
    discovery: { warnWhenNoEntities: true },
    allowGlobalContext: false,
    debug: false,
    colors: false,
    logger,
    pool: {
      min: 1,
      max: 1,
      // An in-memory database lives only as long as its connection: never let the pool drop it.
      idleTimeoutMillis: Number.MAX_SAFE_INTEGER,
      afterCreate: (conn: { exec: (sql: string, done: (err: Error | null) => void) => void }, done: (err: Error | null, conn: unknown) => void) => {
        conn.exec('pragma foreign_keys = on; pragma journal_mode = wal; pragma busy_timeout = 5000; pragma synchronous = normal;', (err) => done(err, conn));
      },
    },
  });
}

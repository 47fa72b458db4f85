import { MikroORM } from '@mikro-orm/sqlite';
import { ormOptions } from './mikro-orm.config.js';

/**
 * Opens the database and applies every pending checked-in migration (never schema sync).
 * @param databaseFile - path to the SQLite file, or ':memory:'
 * @param logger - receives MikroORM's messages
 * @returns the ORM, ready for `orm.em.fork()`
 * @example
 * const orm = await ormInit(':memory:');
 */
export async function ormInit(databaseFile: string, logger?: (message: string) => void): Promise<MikroORM> {
  const orm = await MikroORM.init(ormOptions(databaseFile, logger));
  await orm.getMigrator().up();
  return orm;
}

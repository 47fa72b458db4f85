import { configFromEnv, ConfigError } from '../config.js';
import { ormInit } from '../db.js';
import { DEMO_PASSWORD, DEMO_USERS, demoSeed } from './demo-seed.js';

// `npm run seed -w @demandscape/server`: migrate the configured database and add the demo data.
try {
  const config = configFromEnv(process.env);
  const orm = await ormInit(config.databaseFile);
  const { created } = await demoSeed(orm.em.fork(), config.demoCustomers ? { orm, uploadsDir: config.uploadsDir } : undefined);
  await orm.close(true);
  console.log(created.length ? `Demo data added: ${created.join(', ')}.` : 'Demo data already present; nothing changed.');
  console.log(`Database: ${config.databaseFile}`);
  console.log(`Demo sign-ins (password ${DEMO_PASSWORD}): ${DEMO_USERS.map((u) => `${u.email} (${u.role})`).join(', ')}`);
} catch (err) {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exitCode = 1;
}

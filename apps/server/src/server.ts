import type { Server } from 'node:http';
import { createApp } from './app.js';
import { ConfigError, configFromEnv, type AppConfig } from './config.js';
import { mailCatcherStart, type MailCatcher } from './dev/mail-catcher.js';
import { oauthFakeStart, type OAuthFake } from './dev/oauth-fake.js';
import { stripeFakeLocalStart, type StripeFake } from './dev/stripe-fake.js';
import { DEMO_PASSWORD, DEMO_USERS, demoSeed } from './seed/demo-seed.js';

// Entry point: read config, start the local stand-ins (development), build the app, seed, listen.

function configOrExit(): AppConfig {
  try {
    return configFromEnv(process.env);
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(1);
    }
    throw err;
  }
}

const config = configOrExit();
const stops: (() => Promise<void>)[] = [];
let oauthFake: OAuthFake | undefined;
let mailCatcher: MailCatcher | undefined;
let stripeFake: StripeFake | undefined;

if (config.startStandIns) {
  const fakeBase = `http://localhost:${config.oauthFakePort}`;
  if (config.google.enabled && config.google.authorizationUrl.startsWith(fakeBase)) {
    oauthFake = await oauthFakeStart(config.oauthFakePort, {
      sub: process.env.OAUTH_FAKE_SUBJECT ?? 'fake-google-100000000000000000001',
      email: process.env.OAUTH_FAKE_EMAIL ?? 'owner@larchloaf.example',
      emailVerified: true,
      name: process.env.OAUTH_FAKE_NAME ?? 'Maren Larchwood',
    });
    stops.push(() => oauthFake!.stop());
  }
  if (config.mail.transport === 'smtp' && config.mail.smtpUrl === `smtp://localhost:${config.mail.catcherSmtpPort}`) {
    try {
      mailCatcher = await mailCatcherStart(config.mail.catcherSmtpPort, config.mail.catcherWebPort);
      stops.push(() => mailCatcher!.stop());
    } catch (err) {
      console.warn(`Mail catcher not started (${(err as Error).message}); is another one already running on port ${config.mail.catcherSmtpPort}?`);
    }
  }
}

if (config.startStandIns && config.billing.usesLocalFake) {
  stripeFake = await stripeFakeLocalStart(config);
  if (stripeFake) stops.push(() => stripeFake!.stop());
}
const ds = await createApp(config);
stops.unshift(() => ds.close());
if (config.demoSeed) await demoSeed(ds.orm.em.fork(), config.demoCustomers ? { orm: ds.orm, uploadsDir: config.uploadsDir } : undefined);
await ds.surfaceRunner.start();

const server: Server = ds.app.listen(config.port, config.host ?? '::');
server.on('error', (err) => {
  console.error(`Cannot listen on port ${config.port}: ${err.message}. Set PORT to a free port.`);
  process.exit(1);
});
server.on('listening', () => {
  const lines = [
    '',
    `Demandscape is running at ${config.publicUrl}  (${config.nodeEnv}, database ${config.databaseFile})`,
    ds.servesWeb ? `  web app: served from ${config.webDist}` : `  web app: not built (no ${config.webDist}/index.html); API only`,
  ];
  if (config.demoSeed) {
    lines.push(`  demo sign-ins (password: ${DEMO_PASSWORD})`);
    for (const u of DEMO_USERS) lines.push(`    ${u.role.padEnd(9)} ${u.email}`);
  }
  if (mailCatcher) lines.push(`  mail inbox (local catcher): ${mailCatcher.webUrl}`);
  if (stripeFake) lines.push(`  payments: local stand-in at ${stripeFake.url} (test card 4242 4242 4242 4242; 4000 0000 0000 0002 is declined)`);
  if (oauthFake) lines.push(`  Google sign-in: local stand-in at ${oauthFake.url} (signs in as ${process.env.OAUTH_FAKE_EMAIL ?? 'owner@larchloaf.example'})`);
  console.log(lines.join('\n') + '\n');
});

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  console.log(`${signal}: stopping`);
  await new Promise<void>((resolve) => server.close(() => resolve()));
  for (const stop of stops) await stop().catch(() => {});
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));

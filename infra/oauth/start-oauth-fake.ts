// Standalone local Google sign-in stand-in, for running the server with START_STANDINS=false
// (e.g. end-to-end tests). Usage: npx tsx infra/oauth/start-oauth-fake.ts [port]
// Env: OAUTH_FAKE_EMAIL, OAUTH_FAKE_NAME, OAUTH_FAKE_SUBJECT choose who "signs in".
import { DEFAULT_FAKE_IDENTITY, oauthFakeStart } from '../../apps/server/src/dev/oauth-fake.js';

const port = Number(process.argv[2] ?? process.env.OAUTH_FAKE_PORT ?? 3001);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`port must be a whole number between 0 and 65535 (got ${process.argv[2]})`);
  process.exit(1);
}
const fake = await oauthFakeStart(port, {
  sub: process.env.OAUTH_FAKE_SUBJECT ?? DEFAULT_FAKE_IDENTITY.sub,
  email: process.env.OAUTH_FAKE_EMAIL ?? DEFAULT_FAKE_IDENTITY.email,
  emailVerified: true,
  name: process.env.OAUTH_FAKE_NAME ?? DEFAULT_FAKE_IDENTITY.name,
});
console.log(`OAuth fake on ${fake.url}`);
console.log(`  GOOGLE_AUTH_URL=${fake.url}/authorize GOOGLE_TOKEN_URL=${fake.url}/token GOOGLE_USERINFO_URL=${fake.url}/userinfo`);
const stop = () => void fake.stop().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);

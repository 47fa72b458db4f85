// Standalone local payment stand-in, for running the server with START_STANDINS=false.
// Usage: node infra/stripe-fake/dist/start-cli.js [port]   (after npm run build)
// Env: STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET (must match the server's), STRIPE_FAKE_WEBHOOK_URL.
import { stripeFakeStart } from './stripe-fake.js';

const port = Number(process.argv[2] ?? process.env.STRIPE_API_PORT ?? 3002);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`port must be a whole number between 0 and 65535 (got ${process.argv[2]})`);
  process.exit(1);
}
const fake = await stripeFakeStart({
  port,
  secretKey: process.env.STRIPE_SECRET_KEY ?? 'sk_test_demandscape_local',
  webhookSecret: process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_demandscape_local',
  webhookUrl: process.env.STRIPE_FAKE_WEBHOOK_URL ?? 'http://localhost:3000/api/billing/webhook',
  log: (message) => console.warn(message),
});
console.log(`Payment stand-in on ${fake.url} (checkout pages at ${fake.url}/checkout/<session id>)`);
const stop = () => void fake.stop().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);

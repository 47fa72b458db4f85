// Standalone local mail catcher (maildev), for running the server with START_STANDINS=false.
// Usage: npx tsx infra/mail/start-mail-catcher.ts [smtpPort] [webPort]
import { mailCatcherStart } from '../../apps/server/src/dev/mail-catcher.js';

const [smtpPort, webPort] = [Number(process.argv[2] ?? 1025), Number(process.argv[3] ?? 1080)];
for (const [name, port] of [['smtpPort', smtpPort], ['webPort', webPort]] as const) {
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    console.error(`${name} must be a whole number between 1 and 65535 (got ${port})`);
    process.exit(1);
  }
}
const catcher = await mailCatcherStart(smtpPort, webPort);
console.log(`Mail catcher: SMTP smtp://localhost:${catcher.smtpPort}, inbox ${catcher.webUrl} (REST: GET ${catcher.webUrl}/api/email)`);
const stop = () => void catcher.stop().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);

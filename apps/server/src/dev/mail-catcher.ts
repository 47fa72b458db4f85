import { MailDev } from 'maildev';

/** A running local mail catcher (SMTP in, web inbox and REST API out). */
export interface MailCatcher {
  smtpPort: number;
  /** Web inbox, e.g. http://localhost:1080 (REST: GET /email lists messages). */
  webUrl: string;
  stop(): Promise<void>;
}

/**
 * Starts maildev in-process on loopback so development e-mail never leaves the machine.
 * @param smtpPort - SMTP port the server sends to
 * @param webPort - port of the web inbox
 * @returns the running catcher
 * @example
 * const catcher = await mailCatcherStart(1025, 1080); console.log(catcher.webUrl);
 */
export async function mailCatcherStart(smtpPort: number, webPort: number): Promise<MailCatcher> {
  const maildev = new MailDev({ smtp: smtpPort, ip: '127.0.0.1', web: webPort, webIp: '127.0.0.1', silent: true });
  await maildev.start();
  return { smtpPort, webUrl: `http://localhost:${webPort}`, stop: () => maildev.stop() };
}

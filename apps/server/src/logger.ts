import { pino, type Logger } from 'pino';

/** Paths never written to logs: cookies, credentials, tokens, e-mail addresses. */
export const REDACTED_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  '*.password',
  '*.currentPassword',
  '*.newPassword',
  '*.token',
  '*.email',
  '*.sessionSecret',
];

/**
 * The structured logger (JSON lines on stdout) with secrets and personal data redacted.
 * @param level - pino level, or 'silent'
 * @returns a pino logger
 * @example
 * const log = loggerCreate('info'); log.info({ userId }, 'signed in');
 */
export function loggerCreate(level: string): Logger {
  return pino({ level, redact: { paths: REDACTED_PATHS, censor: '[redacted]' }, base: { service: 'demandscape-server' } });
}

import { pino, stdSerializers, type Logger } from 'pino';

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
  return pino({
    level,
    redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
    base: { service: 'demandscape-server' },
    serializers: { err: errorForLog },
  });
}

const EMAIL_PATTERN = /[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;

/**
 * Serializes an error for the log with e-mail addresses masked (database errors can quote the
 * values of a failed insert).
 * @param err - any thrown value
 * @returns type, message, stack and code, e-mails replaced by `[email]`
 * @example
 * log.error({ err: errorForLog(e) });
 */
export function errorForLog(err: unknown): Record<string, unknown> {
  const plain: { type?: string; message: string; stack?: string } = err instanceof Error ? stdSerializers.err(err) : { message: String(err) };
  const mask = (text: unknown) => (typeof text === 'string' ? text.replace(EMAIL_PATTERN, '[email]') : text);
  return { type: plain.type, message: mask(plain.message), stack: mask(plain.stack), code: (err as { code?: unknown })?.code };
}

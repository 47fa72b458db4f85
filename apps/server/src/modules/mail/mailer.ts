import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';

/** A message as sent; tests read links out of `text`. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends e-mail; with the capture transport every message is also kept in `captured` (tests). */
export interface Mailer {
  /** Sends; a delivery failure is logged, not thrown (the account change has happened; the user can ask again). */
  send(mail: OutgoingMail): Promise<boolean>;
  captured: OutgoingMail[];
  close(): void;
}

/**
 * Creates the mailer: SMTP (the local mail catcher in development) or an in-memory capture for tests.
 * @param options - transport kind, SMTP URL and sender address
 * @param log - where delivery failures go
 * @returns a mailer
 * @example
 * const mailer = mailerCreate({ transport: 'capture', smtpUrl: '', from: 'Demandscape <no-reply@demandscape.example>' }, log);
 */
export function mailerCreate(options: { transport: 'smtp' | 'capture'; smtpUrl: string; from: string }, log: Logger): Mailer {
  const captured: OutgoingMail[] = [];
  const transporter: Transporter =
    options.transport === 'capture' ? nodemailer.createTransport({ jsonTransport: true }) : nodemailer.createTransport(options.smtpUrl);
  return {
    captured,
    async send(mail) {
      try {
        await transporter.sendMail({ from: options.from, ...mail });
      } catch (err) {
        log.error({ err: { message: (err as Error).message, code: (err as { code?: string }).code }, subject: mail.subject }, 'e-mail delivery failed');
        return false;
      }
      if (options.transport === 'capture') captured.push(mail);
      return true;
    },
    close() {
      transporter.close();
    },
  };
}

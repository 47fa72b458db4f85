import nodemailer, { type Transporter } from 'nodemailer';

/** A message as sent; tests read links out of `text`. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends e-mail; with the capture transport every message is also kept in `captured` (tests). */
export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  captured: OutgoingMail[];
  close(): void;
}

/**
 * Creates the mailer: SMTP (the local mail catcher in development) or an in-memory capture for tests.
 * @param options - transport kind, SMTP URL and sender address
 * @returns a mailer
 * @example
 * const mailer = mailerCreate({ transport: 'capture', smtpUrl: '', from: 'Demandscape <no-reply@demandscape.example>' });
 */
export function mailerCreate(options: { transport: 'smtp' | 'capture'; smtpUrl: string; from: string }): Mailer {
  const captured: OutgoingMail[] = [];
  const transporter: Transporter =
    options.transport === 'capture' ? nodemailer.createTransport({ jsonTransport: true }) : nodemailer.createTransport(options.smtpUrl);
  return {
    captured,
    async send(mail) {
      await transporter.sendMail({ from: options.from, ...mail });
      if (options.transport === 'capture') captured.push(mail);
    },
    close() {
      transporter.close();
    },
  };
}

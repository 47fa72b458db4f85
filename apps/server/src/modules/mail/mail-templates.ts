import type { OutgoingMail } from './mailer.js';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function mailFromParts(to: string, subject: string, greeting: string, lines: string[], link: string, linkLabel: string): OutgoingMail {
  const text = [greeting, '', ...lines, '', `${linkLabel}: ${link}`, '', '— Demandscape'].join('\n');
  const html =
    `<p>${escapeHtml(greeting)}</p>` +
    lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('') +
    `<p><a href="${escapeHtml(link)}">${escapeHtml(linkLabel)}</a></p><p>— Demandscape</p>`;
  return { to, subject, text, html };
}

/**
 * The e-mail asking a new user to confirm their address.
 * @param to - recipient address
 * @param name - recipient name
 * @param link - `${PUBLIC_URL}/verify-email?token=…`
 * @returns the message
 * @example
 * mailer.send(verificationMail('a@b.example', 'Ada', link));
 */
export function verificationMail(to: string, name: string, link: string): OutgoingMail {
  return mailFromParts(to, 'Confirm your e-mail for Demandscape', `Hello ${name},`, ['Please confirm this e-mail address for your Demandscape account.'], link, 'Confirm e-mail');
}

/**
 * The e-mail with a one-use password reset link (valid one hour).
 * @param to - recipient address
 * @param name - recipient name
 * @param link - `${PUBLIC_URL}/reset-password?token=…`
 * @returns the message
 * @example
 * mailer.send(passwordResetMail('a@b.example', 'Ada', link));
 */
export function passwordResetMail(to: string, name: string, link: string): OutgoingMail {
  return mailFromParts(
    to,
    'Reset your Demandscape password',
    `Hello ${name},`,
    ['Someone asked to reset the password of your Demandscape account. The link works once, for one hour.', 'If it was not you, ignore this e-mail; your password stays as it is.'],
    link,
    'Choose a new password',
  );
}

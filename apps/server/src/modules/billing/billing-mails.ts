import type { EntityManager } from '@mikro-orm/sqlite';
import type { OutgoingMail } from '../mail/mailer.js';
import { MembershipSchema } from '../organization/membership.entity.js';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * A plain message with an optional link, in the house layout (text and HTML parts).
 * @param to - recipient
 * @param subject - subject line
 * @param lines - paragraphs
 * @param link - optional `{ url, label }`
 * @returns the message
 * @example
 * mailCompose('a@b.example', 'Hello', ['Line'], { url: 'http://…', label: 'Open' });
 */
export function mailCompose(to: string, subject: string, lines: string[], link?: { url: string; label: string }): OutgoingMail {
  const text = [...lines, ...(link ? ['', `${link.label}: ${link.url}`] : []), '', '— Demandscape'].join('\n');
  const html =
    lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('') +
    (link ? `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>` : '') +
    '<p>— Demandscape</p>';
  return { to, subject, text, html };
}

/**
 * E-mail addresses of an organization's owners (they receive billing mail).
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns addresses
 * @example
 * const owners = await ownerEmails(em, orgId);
 */
export async function ownerEmails(em: EntityManager, organizationId: string): Promise<string[]> {
  const owners = await em.find(MembershipSchema, { organization: organizationId, role: 'owner' }, { populate: ['user'] });
  return owners.map((m) => m.user.email);
}

/**
 * Receipt for a credit pack or a seat-plan invoice.
 * @param to - owner address
 * @param organizationName - organization
 * @param description - what was bought
 * @param amountText - formatted amount, e.g. '€60.00'
 * @param billingUrl - link to the billing page
 * @returns the message
 * @example
 * receiptMail('o@x.example', 'Larchloaf', '500 credits', '€60.00', url);
 */
export function receiptMail(to: string, organizationName: string, description: string, amountText: string, billingUrl: string): OutgoingMail {
  return mailCompose(
    to,
    `Demandscape receipt: ${description}`,
    [`Thank you — ${organizationName} paid ${amountText} for ${description}.`, 'Every receipt is listed on the billing page.'],
    { url: billingUrl, label: 'Open billing' },
  );
}

/**
 * Warning that credits run low.
 * @param to - owner address
 * @param organizationName - organization
 * @param balance - credits left
 * @param threshold - the threshold crossed
 * @param billingUrl - link to the billing page
 * @returns the message
 * @example
 * lowBalanceMail('o@x.example', 'Larchloaf', 12, 20, url);
 */
export function lowBalanceMail(to: string, organizationName: string, balance: number, threshold: number, billingUrl: string): OutgoingMail {
  return mailCompose(
    to,
    `${organizationName} has ${balance} Demandscape credits left`,
    [
      `The credit balance of ${organizationName} is down to ${balance} credits (below ${threshold}).`,
      'Demand surfaces that cost more than the balance will not start. Buy a credit pack to keep working.',
    ],
    { url: billingUrl, label: 'Buy credits' },
  );
}

/**
 * Notice that a seat-plan payment failed.
 * @param to - owner address
 * @param organizationName - organization
 * @param amountText - formatted amount due
 * @param billingUrl - link to the billing page
 * @returns the message
 * @example
 * paymentFailedMail('o@x.example', 'Larchloaf', '€156.00', url);
 */
export function paymentFailedMail(to: string, organizationName: string, amountText: string, billingUrl: string): OutgoingMail {
  return mailCompose(
    to,
    `Payment failed for ${organizationName}'s Demandscape seats`,
    [
      `We could not collect ${amountText} for ${organizationName}'s seat plan. The plan is now past due; members keep access while the payment provider retries.`,
      'Update the card with the payment provider, or change the number of seats on the billing page.',
    ],
    { url: billingUrl, label: 'Open billing' },
  );
}

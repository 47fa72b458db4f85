import type { OutgoingMail } from '../mail/mailer.js';
import type { Role } from '../organization/membership.entity.js';
import { mailCompose } from '../billing/billing-mails.js';

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (billing, seats, invitations and everything else)',
  analyst: 'an analyst (customer files and demand surfaces)',
  planner: 'a planner (sites, scoring and shortlists)',
  executive: 'an executive (reads shortlists, rankings and surfaces)',
};

/**
 * The invitation e-mail with its one-time link.
 * @param to - invited address
 * @param organizationName - organization
 * @param inviterName - who invites
 * @param role - the role offered
 * @param link - `${PUBLIC_URL}/invitations/accept?token=…`
 * @param expiresAt - when the link stops working
 * @returns the message
 * @example
 * invitationMail('ana@x.example', 'Larchloaf', 'Maren', 'analyst', link, expires);
 */
export function invitationMail(to: string, organizationName: string, inviterName: string, role: Role, link: string, expiresAt: Date): OutgoingMail {
  return mailCompose(
    to,
    `${inviterName} invited you to ${organizationName} on Demandscape`,
    [
      `${inviterName} invited you to join ${organizationName} on Demandscape as ${ROLE_WORDS[role]}.`,
      `Sign in (or create an account) with this e-mail address, then accept. The link works once, until ${expiresAt.toISOString().slice(0, 10)}.`,
    ],
    { url: link, label: 'Accept the invitation' },
  );
}

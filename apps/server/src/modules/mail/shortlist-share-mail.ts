import type { OutgoingMail } from './mailer.js';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** What the share e-mail says about the shortlist. */
export interface ShortlistShareMailInput {
  to: string;
  recipientName: string;
  sharerName: string;
  shortlistName: string;
  workspaceName: string;
  organizationName: string;
  version: number;
  /** Site names in the planner's order (the first three are named). */
  siteNames: string[];
  /** The planner's optional message. */
  message: string;
  caution: string;
  /** `${PUBLIC_URL}/orgs/:orgId/shortlists/:shortlistId` */
  link: string;
}

/**
 * The e-mail telling a member (usually an executive) that a shortlist was shared with them: who
 * shared which shortlist (workspace, version, number of sites, the first three), the planner's
 * message, the caution and the link to the read-only shortlist page. Plain text and HTML parts.
 * @param m - recipient, shortlist facts, message and link
 * @returns the message
 * @example
 * await mailer.send(shortlistShareMail({ to: 'eve@larchloaf.example', recipientName: 'Eve', sharerName: 'Pia', shortlistName: 'Board pick', workspaceName: 'North corridor', organizationName: 'Larchloaf', version: 2, siteNames: ['Mill Lane'], message: '', caution, link }));
 */
export function shortlistShareMail(m: ShortlistShareMailInput): OutgoingMail {
  const n = m.siteNames.length;
  const first = m.siteNames
    .slice(0, 3)
    .map((name, k) => `${k + 1}. ${name}`)
    .join(', ');
  const lines = [
    `Hello ${m.recipientName},`,
    `${m.sharerName} shared the shortlist "${m.shortlistName}" (workspace "${m.workspaceName}", ${m.organizationName}, version ${m.version}) with you: ${n} site${n === 1 ? '' : 's'}, starting with ${first}${n > 3 ? ', …' : ''}.`,
    ...(m.message ? [`Message from ${m.sharerName}:`, m.message] : []),
    'The page shows each site’s rank, key numbers, the reason it ranks there and a map; you can download the Excel report there.',
    m.caution,
  ];
  const subject = `${m.sharerName} shared the shortlist "${m.shortlistName}" with you`;
  const label = 'Open the shortlist';
  const text = [...lines.flatMap((l) => [l, '']), `${label}: ${m.link}`, '', '— Demandscape'].join(
    '\n',
  );
  const html =
    lines.map((l) => `<p>${escapeHtml(l).replace(/\n/g, '<br>')}</p>`).join('') +
    `<p><a href="${escapeHtml(m.link)}">${label}</a></p><p>— Demandscape</p>`;
  return { to: m.to, subject: subject.replace(/[\r\n]+/g, ' '), text, html };
}

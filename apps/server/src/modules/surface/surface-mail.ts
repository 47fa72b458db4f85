import type { OutgoingMail } from '../mail/mailer.js';
import type { Surface } from './surface.entity.js';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * The e-mail to a run's creator when it succeeds or fails, linking to the workspace.
 * @param surface the finished run (createdBy and workspace loaded)
 * @param publicUrl the app's public address
 * @returns the message
 * @example
 * await mailer.send(surfaceFinishedMail(surface, 'http://localhost:3000'));
 */
export function surfaceFinishedMail(surface: Surface, publicUrl: string): OutgoingMail {
  const user = surface.createdBy!;
  const link = `${publicUrl}/orgs/${surface.organization.id}/workspaces/${surface.workspace.id}?surface=${surface.id}`;
  const ok = surface.status === 'succeeded';
  const subject = ok ? `Demand surface ready: ${surface.name}` : `Demand surface failed: ${surface.name}`;
  const lines = ok
    ? [`Your demand surface "${surface.name}" in the workspace "${surface.workspace.name}" is ready.`]
    : [
        `Your demand surface "${surface.name}" in the workspace "${surface.workspace.name}" could not be computed:`,
        surface.error?.message ?? 'unknown reason',
        'Its settings are kept; open it to change them or retry.',
      ];
  const greeting = `Hello ${user.name},`;
  const text = [greeting, '', ...lines, '', `Open the workspace: ${link}`, '', '— Demandscape'].join('\n');
  const html =
    `<p>${escapeHtml(greeting)}</p>` +
    lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('') +
    `<p><a href="${escapeHtml(link)}">Open the workspace</a></p><p>— Demandscape</p>`;
  return { to: user.email, subject, text, html };
}

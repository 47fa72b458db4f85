import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { AppError, ValidationError } from '../common/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { shortlistShareMail } from '../mail/shortlist-share-mail.js';
import { MembershipSchema, type Membership } from '../organization/membership.entity.js';
import { OrganizationSchema } from '../organization/organization.entity.js';
import type { User } from '../user/user.entity.js';
import { SHORTLIST_CAUTION } from './shortlist-caution.js';
import { ShortlistVersionSchema } from './shortlist.entity.js';
import type { ShortlistShareInput } from './shortlist.schemas.js';
import { shortlistLoad, type ShortlistScope } from './shortlist.service.js';
import type { ShortlistJson } from './shortlist.types.js';

/** Result of a share: everyone it has been shared with so far, and this round's undelivered e-mails. */
export interface ShortlistShareResult {
  sharedWith: ShortlistJson['sharedWith'];
  failed: Array<{ userId: string; name: string }>;
}

async function recipientsFind(
  em: EntityManager,
  organizationId: string,
  userIds: string[] | undefined,
): Promise<Membership[]> {
  if (userIds) {
    const unique = [...new Set(userIds)];
    const members = await em.find(
      MembershipSchema,
      { organization: organizationId, user: { $in: unique } },
      { populate: ['user'] },
    );
    const missing = unique.filter((id) => !members.some((m) => m.user.id === id));
    if (missing.length > 0)
      throw new ValidationError(
        `userIds: ${missing.join(', ')} ${missing.length === 1 ? 'is not a member' : 'are not members'} of this organization; share only with members`,
        'userIds',
      );
    return members;
  }
  const executives = await em.find(
    MembershipSchema,
    { organization: organizationId, role: 'executive' },
    { populate: ['user'], orderBy: { createdAt: 'asc' } },
  );
  if (executives.length === 0) {
    throw new AppError(
      400,
      'NO_EXECUTIVES',
      'This organization has no executive yet: invite an executive first (Members → Invite, role executive), or choose members to share with.',
      'userIds',
    );
  }
  return executives;
}

/**
 * Shares the latest version of a shortlist by e-mail: with the given members, or by default with
 * every executive of the organization (400 NO_EXECUTIVES when there is none). Each recipient gets a
 * link to `${publicUrl}/orgs/:orgId/shortlists/:shortlistId`; delivered recipients are added to
 * `sharedWith` (a repeat share updates the time); records `shortlist.share` (user ids and counts, no addresses).
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param shortlistId - the shortlist
 * @param actor - the planner or owner who shares
 * @param input - optional message and member user ids
 * @param deps - mailer and the app's public URL
 * @returns everyone shared with so far and the recipients whose e-mail failed
 * @throws AppError 502 MAIL_NOT_SENT when no e-mail could be delivered
 * @example
 * const { sharedWith } = await shortlistShare(em, scope, id, user, { message: 'For Thursday' }, { mailer, publicUrl });
 */
export async function shortlistShare(
  em: EntityManager,
  scope: ShortlistScope,
  shortlistId: string,
  actor: User,
  input: ShortlistShareInput,
  deps: { mailer: Mailer; publicUrl: string },
): Promise<ShortlistShareResult> {
  const s = await shortlistLoad(em, scope, shortlistId);
  const recipients = await recipientsFind(em, scope.organizationId, input.userIds);
  const latest = await em.findOneOrFail(ShortlistVersionSchema, {
    shortlist: s.id,
    version: s.latestVersion,
  });
  const organization = await em.findOneOrFail(OrganizationSchema, { id: scope.organizationId });
  const link = `${deps.publicUrl}/orgs/${scope.organizationId}/shortlists/${s.id}`;
  const now = new Date();
  const delivered: ShortlistJson['sharedWith'] = [];
  const failed: ShortlistShareResult['failed'] = [];
  for (const m of recipients) {
    const ok = await deps.mailer.send(
      shortlistShareMail({
        to: m.user.email,
        recipientName: m.user.name,
        sharerName: actor.name,
        shortlistName: s.name,
        workspaceName: s.workspace.name,
        organizationName: organization.name,
        version: latest.version,
        siteNames: latest.snapshot.items.map((i) => i.name),
        message: input.message ?? '',
        caution: SHORTLIST_CAUTION,
        link,
      }),
    );
    if (ok)
      delivered.push({
        userId: m.user.id,
        name: m.user.name,
        email: m.user.email,
        sharedAt: now.toISOString(),
      });
    else failed.push({ userId: m.user.id, name: m.user.name });
  }
  if (delivered.length === 0)
    throw new AppError(
      502,
      'MAIL_NOT_SENT',
      'The e-mail could not be sent to anyone; nothing was shared. Check the mail server settings and try again.',
    );
  const ids = new Set(delivered.map((d) => d.userId));
  s.sharedWith = [...s.sharedWith.filter((x) => !ids.has(x.userId)), ...delivered];
  s.sharedAt = now;
  auditRecord(em, {
    action: 'shortlist.share',
    organizationId: scope.organizationId,
    actor,
    target: { type: 'shortlist', id: s.id },
    details: {
      workspaceId: scope.workspaceId,
      version: latest.version,
      userIds: [...ids],
      failed: failed.length,
      withMessage: Boolean(input.message),
    },
  });
  await em.flush();
  return { sharedWith: s.sharedWith, failed };
}

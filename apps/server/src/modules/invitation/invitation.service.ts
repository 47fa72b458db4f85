import { createHash, randomBytes } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import { auditRecord } from '../audit/audit.service.js';
import { AppError, ConflictError, NotFoundError } from '../common/errors.js';
import { entityId } from '../common/base.entity.js';
import type { Mailer } from '../mail/mailer.js';
import { MembershipSchema, type Membership, type Role } from '../organization/membership.entity.js';
import type { Organization } from '../organization/organization.entity.js';
import { organizationView, type OrganizationView } from '../organization/organization.service.js';
import { UserSchema, type User } from '../user/user.entity.js';
import { seatsFreeAssert } from '../billing/seats.service.js';
import { InvitationSchema, type Invitation } from './invitation.entity.js';
import { invitationMail } from './invitation-mail.js';

/** How long an invitation link works. */
export const INVITATION_TTL_MS = 7 * 24 * 3600_000;

/** Where an invitation stands. */
export type InvitationStatus = 'pending' | 'expired' | 'accepted' | 'revoked';

function tokenHash(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function statusOf(inv: Invitation, now = Date.now()): InvitationStatus {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  return new Date(inv.expiresAt).getTime() <= now ? 'expired' : 'pending';
}

function emailMasked(email: string): string {
  const [local, domain] = email.split('@');
  return `${local.slice(0, 1)}${'*'.repeat(Math.max(1, local.length - 1))}@${domain}`;
}

/** An invitation as owners see it. */
export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  status: InvitationStatus;
  invitedBy: { id: string; name: string } | null;
  expiresAt: string;
  createdAt: string;
}

function invitationView(inv: Invitation): InvitationView {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    status: statusOf(inv),
    invitedBy: inv.invitedBy ? { id: inv.invitedBy.id, name: inv.invitedBy.name } : null,
    expiresAt: new Date(inv.expiresAt).toISOString(),
    createdAt: new Date(inv.createdAt).toISOString(),
  };
}

/** What invitation routes need besides the entity manager. */
export interface InvitationDeps {
  em: EntityManager;
  mailer: Mailer;
  publicUrl: string;
}

async function tokenIssue(deps: InvitationDeps, inv: Invitation, org: Organization, inviter: User): Promise<void> {
  const token = randomBytes(32).toString('base64url');
  inv.tokenHash = tokenHash(token);
  inv.expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  const link = `${deps.publicUrl}/invitations/accept?token=${token}`;
  await deps.em.flush();
  await deps.mailer.send(invitationMail(inv.email, org.name, inviter.name, inv.role, link, inv.expiresAt));
}

/**
 * Invites an e-mail address with a role. An open invitation holds a seat, so the seat check and
 * the insert run in one transaction.
 * @param deps - entity manager, mailer, public URL
 * @param org - the organization
 * @param inviter - the owner
 * @param input - e-mail (normalised) and role
 * @returns the invitation
 * @throws ConflictError ALREADY_MEMBER / INVITATION_EXISTS / SEATS_EXHAUSTED
 * @example
 * await invitationCreate(deps, org, owner, { email: 'ana@larchloaf.example', role: 'analyst' });
 */
export async function invitationCreate(deps: InvitationDeps, org: Organization, inviter: User, input: { email: string; role: Role }): Promise<InvitationView> {
  const inv = await deps.em.transactional(async (tem) => {
    const existingUser = await tem.findOne(UserSchema, { email: input.email });
    if (existingUser && (await tem.count(MembershipSchema, { organization: org.id, user: existingUser.id }))) {
      throw new ConflictError('ALREADY_MEMBER', `${input.email} is already a member of ${org.name}; change their role on the members page instead.`, 'email');
    }
    const open = await tem.findOne(InvitationSchema, { organization: org.id, email: input.email, acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } });
    if (open) throw new ConflictError('INVITATION_EXISTS', `An invitation to ${input.email} is already open — resend it instead of inviting again.`, 'email');
    await seatsFreeAssert(tem, org.id);
    const created = tem.create(InvitationSchema, {
      id: entityId(),
      organization: org,
      email: input.email,
      role: input.role,
      tokenHash: `pending-${entityId()}`,
      invitedBy: inviter,
      expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
      acceptedAt: null,
      acceptedBy: null,
      revokedAt: null,
    } as Invitation);
    auditRecord(tem, { action: 'invitation.create', organizationId: org.id, actor: inviter, target: { type: 'invitation', id: created.id }, details: { role: input.role } });
    return created;
  });
  const merged = deps.em.merge(inv);
  await tokenIssue(deps, merged, org, inviter);
  return invitationView(merged);
}

/**
 * The organization's invitations, newest first (pending, expired, accepted and revoked).
 * @param em - entity manager
 * @param organizationId - the organization
 * @returns invitations
 * @example
 * const list = await invitationList(em, orgId);
 */
export async function invitationList(em: EntityManager, organizationId: string): Promise<InvitationView[]> {
  const rows = await em.find(InvitationSchema, { organization: organizationId }, { populate: ['invitedBy'], orderBy: { createdAt: 'desc' }, limit: 200 });
  return rows.map(invitationView);
}

async function invitationOfOrg(em: EntityManager, organizationId: string, id: string): Promise<Invitation> {
  const inv = await em.findOne(InvitationSchema, { id, organization: organizationId }, { populate: ['invitedBy'] });
  if (!inv) throw new NotFoundError('Invitation');
  return inv;
}

/**
 * Withdraws an invitation; its link stops working and its seat is free again.
 * @param em - entity manager
 * @param org - the organization
 * @param actor - the owner
 * @param id - invitation id
 * @returns nothing
 * @throws ConflictError INVITATION_ACCEPTED when it was already accepted (remove the member instead)
 * @example
 * await invitationRevoke(em, org, owner, invitationId);
 */
export async function invitationRevoke(em: EntityManager, org: Organization, actor: User, id: string): Promise<void> {
  const inv = await invitationOfOrg(em, org.id, id);
  if (inv.acceptedAt) throw new ConflictError('INVITATION_ACCEPTED', 'This invitation was already accepted — remove the member instead.');
  if (inv.revokedAt) return;
  inv.revokedAt = new Date();
  auditRecord(em, { action: 'invitation.revoke', organizationId: org.id, actor, target: { type: 'invitation', id: inv.id }, details: { role: inv.role } });
  await em.flush();
}

/**
 * Sends a fresh link (the old one stops working) valid for another 7 days. Reopening an expired
 * invitation needs a free seat.
 * @param deps - entity manager, mailer, public URL
 * @param org - the organization
 * @param actor - the owner
 * @param id - invitation id
 * @returns the invitation
 * @throws ConflictError INVITATION_CLOSED (accepted or revoked) / SEATS_EXHAUSTED
 * @example
 * await invitationResend(deps, org, owner, invitationId);
 */
export async function invitationResend(deps: InvitationDeps, org: Organization, actor: User, id: string): Promise<InvitationView> {
  const inv = await invitationOfOrg(deps.em, org.id, id);
  const status = statusOf(inv);
  if (status === 'accepted' || status === 'revoked') {
    throw new ConflictError('INVITATION_CLOSED', `This invitation was ${status}; invite the address again instead.`);
  }
  if (status === 'expired') await seatsFreeAssert(deps.em, org.id);
  auditRecord(deps.em, { action: 'invitation.resend', organizationId: org.id, actor, target: { type: 'invitation', id: inv.id }, details: { role: inv.role } });
  await tokenIssue(deps, inv, org, actor);
  return invitationView(inv);
}

async function invitationByToken(em: EntityManager, token: string): Promise<Invitation> {
  const inv = await em.findOne(InvitationSchema, { tokenHash: tokenHash(token) }, { populate: ['organization', 'invitedBy'] });
  if (!inv) throw new NotFoundError('Invitation');
  return inv;
}

/**
 * What the invitation page shows before accepting (public: the token is the credential).
 * @param em - entity manager
 * @param token - token from the link
 * @returns organization name, role, inviter, invited e-mail, expiry and status
 * @throws NotFoundError for an unknown (or replaced) token
 * @example
 * const { invitation } = await invitationPreview(em, token);
 */
export async function invitationPreview(em: EntityManager, token: string) {
  const inv = await invitationByToken(em, token);
  const status = statusOf(inv);
  return {
    invitation: {
      organization: { id: inv.organization.id, name: inv.organization.name },
      role: inv.role,
      invitedBy: inv.invitedBy ? { name: inv.invitedBy.name } : null,
      email: inv.email,
      expiresAt: new Date(inv.expiresAt).toISOString(),
      expired: status === 'expired',
      status,
    },
  };
}

/**
 * Joins the organization through an invitation. The signed-in account's e-mail must be the invited one.
 * @param em - entity manager
 * @param user - the signed-in user
 * @param token - token from the link
 * @returns the organization and the role received
 * @throws AppError 410 INVITATION_EXPIRED / INVITATION_REVOKED, 409 INVITATION_USED / ALREADY_MEMBER, 403 INVITATION_EMAIL_MISMATCH
 * @example
 * const { organization, role } = await invitationAccept(em, user, token);
 */
export async function invitationAccept(em: EntityManager, user: User, token: string): Promise<{ organization: OrganizationView; role: Role }> {
  return em.transactional(async (tem) => {
    const inv = await invitationByToken(tem, token);
    const status = statusOf(inv);
    const orgName = inv.organization.name;
    if (status === 'accepted') throw new ConflictError('INVITATION_USED', `This invitation to ${orgName} was already accepted.`);
    if (status === 'revoked') throw new AppError(410, 'INVITATION_REVOKED', `This invitation to ${orgName} was withdrawn — ask an owner of ${orgName} for a new one.`);
    if (status === 'expired') {
      throw new AppError(410, 'INVITATION_EXPIRED', `This invitation to ${orgName} expired on ${new Date(inv.expiresAt).toISOString().slice(0, 10)} — ask an owner of ${orgName} to resend it.`);
    }
    if (user.email !== inv.email) {
      throw new AppError(
        403,
        'INVITATION_EMAIL_MISMATCH',
        `This invitation was sent to ${emailMasked(inv.email)}, but you are signed in as ${user.email}. Sign out and sign in (or sign up) with the invited address, or ask for an invitation to ${user.email}.`,
      );
    }
    if (await tem.count(MembershipSchema, { organization: inv.organization.id, user: user.id })) {
      throw new ConflictError('ALREADY_MEMBER', `You are already a member of ${orgName}.`);
    }
    tem.create(MembershipSchema, { id: entityId(), organization: inv.organization, user: tem.getReference(UserSchema, user.id), role: inv.role } as Membership);
    inv.acceptedAt = new Date();
    inv.acceptedBy = tem.getReference(UserSchema, user.id);
    auditRecord(tem, { action: 'invitation.accept', organizationId: inv.organization.id, actor: tem.getReference(UserSchema, user.id), target: { type: 'invitation', id: inv.id }, details: { role: inv.role } });
    return { organization: organizationView(inv.organization), role: inv.role };
  });
}

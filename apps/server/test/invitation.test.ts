import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { InvitationSchema } from '../src/modules/invitation/invitation.entity.js';
import { testSeatsSet } from './billing-utils.js';
import { mailedToken, testAppCreate, testClient, testUserSignedIn, type TestClient } from './utils.js';

describe('invitations', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let orgId: string;
  let inv: string;

  async function invite(email: string, role = 'analyst'): Promise<{ id: string; token: string }> {
    const res = await owner.post(inv, { email, role }).expect(201);
    return { id: res.body.invitation.id, token: mailedToken(ds, email, '/invitations/accept') };
  }

  beforeAll(async () => {
    ds = await testAppCreate();
    owner = (await testUserSignedIn(ds, 'owner@invite.example', 'Maren Owner')).client;
    orgId = (await owner.post('/api/organizations', { name: 'Quillport Crumbs' }).expect(201)).body.organization.id;
    inv = `/api/organizations/${orgId}/invitations`;
    await testSeatsSet(ds, orgId, 20);
  });
  afterAll(() => ds.close());

  it('e-mails a one-time link, stores only the token hash and shows the invitation publicly by token', async () => {
    const res = await owner.post(inv, { email: '  Ana@Invite.example ', role: 'analyst' }).expect(201);
    expect(res.body.invitation).toMatchObject({ email: 'ana@invite.example', role: 'analyst', status: 'pending', invitedBy: { name: 'Maren Owner' } });
    const mail = ds.mailbox.at(-1)!;
    expect(mail.to).toBe('ana@invite.example');
    expect(mail.subject).toBe('Maren Owner invited you to Quillport Crumbs on Demandscape');
    expect(mail.text).toMatch(/http:\/\/localhost:3999\/invitations\/accept\?token=[A-Za-z0-9_-]{40,}/);
    const token = mailedToken(ds, 'ana@invite.example', '/invitations/accept');
    const row = await ds.orm.em.fork().findOneOrFail(InvitationSchema, res.body.invitation.id);
    expect(row.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    const anonymous = await testClient(ds);
    const preview = await anonymous.get(`/api/invitations/${token}`).expect(200);
    expect(preview.body.invitation).toMatchObject({ organization: { id: orgId, name: 'Quillport Crumbs' }, role: 'analyst', invitedBy: { name: 'Maren Owner' }, expired: false, status: 'pending' });
    expect(new Date(preview.body.invitation.expiresAt).getTime() - Date.now()).toBeGreaterThan(6.9 * 86400_000);
    await anonymous.get('/api/invitations/not-a-real-token-at-all-000000').expect(404);
  });

  it('refuses a signed-in account with another e-mail, then accepts for the invited address', async () => {
    const token = mailedToken(ds, 'ana@invite.example', '/invitations/accept');
    const other = await testUserSignedIn(ds, 'someone@else.example', 'Someone Else');
    const wrong = await other.client.post('/api/invitations/accept', { token }).expect(403);
    expect(wrong.body.error.code).toBe('INVITATION_EMAIL_MISMATCH');
    expect(wrong.body.error.message).toContain('a**@invite.example, but you are signed in as someone@else.example');
    const anonymous = await testClient(ds);
    await anonymous.post('/api/invitations/accept', { token }).expect(401);

    const ana = await testUserSignedIn(ds, 'ana@invite.example', 'Ana Analyst');
    const ok = await ana.client.post('/api/invitations/accept', { token }).expect(200);
    expect(ok.body).toMatchObject({ organization: { id: orgId, name: 'Quillport Crumbs' }, role: 'analyst' });
    const mine = await ana.client.get('/api/organizations').expect(200);
    expect(mine.body.organizations).toMatchObject([{ id: orgId, role: 'analyst' }]);
    const again = await ana.client.post('/api/invitations/accept', { token }).expect(409);
    expect(again.body.error.code).toBe('INVITATION_USED');
    const list = (await owner.get(inv).expect(200)).body.invitations;
    expect(list.find((i: { email: string }) => i.email === 'ana@invite.example').status).toBe('accepted');
    const audit = (await owner.get(`/api/organizations/${orgId}/audit-events`).expect(200)).body.events.map((e: { action: string }) => e.action);
    expect(audit).toEqual(expect.arrayContaining(['invitation.create', 'invitation.accept']));
  });

  it('refuses to invite a member or an address with an open invitation', async () => {
    const member = await owner.post(inv, { email: 'ana@invite.example', role: 'planner' }).expect(409);
    expect(member.body.error).toMatchObject({ code: 'ALREADY_MEMBER', field: 'email' });
    await invite('pia@invite.example', 'planner');
    const twice = await owner.post(inv, { email: 'pia@invite.example', role: 'planner' }).expect(409);
    expect(twice.body.error.code).toBe('INVITATION_EXISTS');
    const bad = await owner.post(inv, { email: 'not-an-address', role: 'chef' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'role']);
  });

  it('expires after 7 days; resending sends a new link and the old one stops working', async () => {
    const first = await invite('eve@invite.example', 'executive');
    await ds.orm.em.fork().nativeUpdate(InvitationSchema, { id: first.id }, { expiresAt: new Date(Date.now() - 1000) });
    const anonymous = await testClient(ds);
    expect((await anonymous.get(`/api/invitations/${first.token}`).expect(200)).body.invitation).toMatchObject({ expired: true, status: 'expired' });
    const eve = await testUserSignedIn(ds, 'eve@invite.example', 'Eve Exec');
    const expired = await eve.client.post('/api/invitations/accept', { token: first.token }).expect(410);
    expect(expired.body.error.code).toBe('INVITATION_EXPIRED');
    expect(expired.body.error.message).toContain('ask an owner of Quillport Crumbs to resend it');

    const resent = await owner.post(`${inv}/${first.id}/resend`).expect(200);
    expect(resent.body.invitation.status).toBe('pending');
    const second = mailedToken(ds, 'eve@invite.example', '/invitations/accept');
    expect(second).not.toBe(first.token);
    await anonymous.get(`/api/invitations/${first.token}`).expect(404);
    await eve.client.post('/api/invitations/accept', { token: second }).expect(200);
  });

  it('revokes: the link stops working, the seat is free, an accepted invitation cannot be revoked', async () => {
    const { id, token } = await invite('rex@invite.example', 'planner');
    await owner.del(`${inv}/${id}`).expect(204);
    await owner.del(`${inv}/${id}`).expect(204);
    const rex = await testUserSignedIn(ds, 'rex@invite.example', 'Rex');
    const revoked = await rex.client.post('/api/invitations/accept', { token }).expect(410);
    expect(revoked.body.error.code).toBe('INVITATION_REVOKED');
    const resend = await owner.post(`${inv}/${id}/resend`).expect(409);
    expect(resend.body.error.code).toBe('INVITATION_CLOSED');
    const accepted = (await owner.get(inv).expect(200)).body.invitations.find((i: { status: string }) => i.status === 'accepted');
    expect((await owner.del(`${inv}/${accepted.id}`).expect(409)).body.error.code).toBe('INVITATION_ACCEPTED');
    const audit = (await owner.get(`/api/organizations/${orgId}/audit-events?action=invitation.revoke`).expect(200)).body.events;
    expect(audit).toHaveLength(1);
    expect(JSON.stringify(audit[0].details)).not.toContain('@');
  });

  it('counts open invitations against the seat limit', async () => {
    await testSeatsSet(ds, orgId, 4);
    const usage = (await owner.get(`/api/organizations/${orgId}/billing`).expect(200)).body.seats;
    expect(usage).toMatchObject({ members: 3, pendingInvitations: 1, used: 4, limit: 4 });
    const full = await owner.post(inv, { email: 'late@invite.example', role: 'executive' }).expect(409);
    expect(full.body.error).toMatchObject({ code: 'SEATS_EXHAUSTED', message: 'All 4 paid seats are used (3 members, 1 open invitation) — add seats on the billing page first' });
  });

  it('lets only owners manage invitations; other organizations get 404', async () => {
    const ana = await testUserSignedIn(ds, 'ana2@invite.example', 'Ana Two');
    const stranger = ana.client;
    await stranger.get(inv).expect(404);
    const member = (await owner.get(inv).expect(200)).body.invitations[0];
    await stranger.del(`${inv}/${member.id}`).expect(404);
  });
});

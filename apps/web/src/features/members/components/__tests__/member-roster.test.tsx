import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { createMember } from '../../../../testing/data-generators';
import { renderWithProviders } from '../../../../testing/test-utils';
import { MemberRoster } from '../member-roster';

const base = '*/api/organizations/org_1/members';

describe('MemberRoster', () => {
  it('shows the server’s LAST_OWNER message when the last owner is demoted', async () => {
    const owner = createMember('owner', { userId: 'usr_owner', name: 'Wren Applegarth' });
    server.use(
      http.patch(`${base}/usr_owner`, () =>
        apiErrorResponse(409, 'LAST_OWNER', 'Wren Applegarth is the last owner of Larchloaf, so they cannot be demoted — make another member owner first.'),
      ),
    );
    renderWithProviders(<MemberRoster orgId="org_1" orgName="Larchloaf" members={[owner]} canManage currentUserId="usr_owner" />);
    await userEvent.selectOptions(screen.getByLabelText('Role of Wren Applegarth'), 'analyst');
    expect(
      await screen.findByText('Wren Applegarth is the last owner of Larchloaf, so they cannot be demoted — make another member owner first.'),
    ).toBeInTheDocument();
    expect(screen.getByText('The role was not changed')).toBeInTheDocument();
  });

  it('changes a role and removes a member after confirming', async () => {
    const analyst = createMember('analyst', { userId: 'usr_a', name: 'Tobiah Crane' });
    const calls: string[] = [];
    server.use(
      http.patch(`${base}/usr_a`, async ({ request }) => {
        calls.push(`patch ${JSON.stringify(await request.json())}`);
        return HttpResponse.json({ member: { ...analyst, role: 'planner' } });
      }),
      http.delete(`${base}/usr_a`, () => {
        calls.push('delete');
        return new HttpResponse(null, { status: 204 });
      }),
      http.get(base, () => HttpResponse.json({ members: [] })),
      http.get('*/api/me', () => apiErrorResponse(401, 'UNAUTHENTICATED', 'Sign in.')),
      http.get('*/api/organizations/org_1/billing', () => HttpResponse.json({})),
    );
    renderWithProviders(<MemberRoster orgId="org_1" orgName="Larchloaf" members={[analyst]} canManage currentUserId="usr_owner" />);
    await userEvent.selectOptions(screen.getByLabelText('Role of Tobiah Crane'), 'planner');
    await expect.poll(() => calls).toEqual(['patch {"role":"planner"}']);

    await userEvent.click(screen.getByRole('button', { name: 'Remove Tobiah Crane' }));
    const dialog = await screen.findByRole('dialog', { name: 'Remove Tobiah Crane?' });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Remove member' }));
    await expect.poll(() => calls).toEqual(['patch {"role":"planner"}', 'delete']);
  });

  it('gives other roles a read-only list', () => {
    renderWithProviders(
      <MemberRoster orgId="org_1" orgName="Larchloaf" members={[createMember('owner', { name: 'Wren Applegarth' })]} canManage={false} currentUserId={null} />,
    );
    expect(screen.getByText('Owner')).toBeInTheDocument();
    expect(screen.queryByRole('combobox')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Remove/ })).not.toBeInTheDocument();
  });
});

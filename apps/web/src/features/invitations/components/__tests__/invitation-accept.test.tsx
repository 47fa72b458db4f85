import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createMe, createOrganization } from '../../../../testing/data-generators';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderApp } from '../../../../testing/test-utils';
import { createInvitationPreview } from '../../testing/invitation-factories';

const TOKEN = 'tok_0123456789abcdefghijklmnop';

describe('the invitation accept page', () => {
  it('shows organization, role and inviter to a signed-out visitor and offers sign-up and sign-in that return here', async () => {
    server.use(http.get(`*/api/invitations/${TOKEN}`, () => HttpResponse.json({ invitation: createInvitationPreview() })));
    renderApp(`/invitations/accept?token=${TOKEN}`);
    expect(await screen.findByText(/Wren Applegarth invites you to join/)).toHaveTextContent('Wren Applegarth invites you to join Larchloaf on Demandscape as Analyst.');
    expect(screen.getByText('tobiah@larchloaf.test')).toBeInTheDocument();
    const back = encodeURIComponent(`/invitations/accept?token=${TOKEN}`);
    expect(screen.getByRole('link', { name: 'Create an account' })).toHaveAttribute('href', `/sign-up?redirectTo=${back}`);
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', `/sign-in?redirectTo=${back}`);
    expect(screen.queryByRole('button', { name: /Join/ })).not.toBeInTheDocument();
  });

  it('says so when the invitation has expired', async () => {
    server.use(http.get(`*/api/invitations/${TOKEN}`, () => HttpResponse.json({ invitation: createInvitationPreview({ status: 'expired', expired: true }) })));
    renderApp(`/invitations/accept?token=${TOKEN}`);
    expect(await screen.findByText('This invitation has expired')).toBeInTheDocument();
  });

  it('explains an unknown link', async () => {
    server.use(http.get(`*/api/invitations/${TOKEN}`, () => apiErrorResponse(404, 'NOT_FOUND', 'Invitation not found.')));
    renderApp(`/invitations/accept?token=${TOKEN}`);
    expect(await screen.findByText('This invitation link does not work')).toBeInTheDocument();
  });

  it('accepts for the signed-in invitee and opens the organization', async () => {
    const org = createOrganization({ id: 'org_1', name: 'Larchloaf', role: 'analyst' });
    let joined = false;
    server.use(
      http.get(`*/api/invitations/${TOKEN}`, () => HttpResponse.json({ invitation: createInvitationPreview() })),
      http.get('*/api/me', () => HttpResponse.json(createMe(joined ? [org] : [], { email: 'tobiah@larchloaf.test', name: 'Tobiah Crane' }))),
      http.get('*/api/organizations', () => HttpResponse.json({ organizations: joined ? [org] : [] })),
      http.post('*/api/invitations/accept', () => {
        joined = true;
        return HttpResponse.json({ organization: { id: 'org_1', name: 'Larchloaf', slug: 'larchloaf' }, role: 'analyst' });
      }),
      http.get('*/api/organizations/org_1/workspaces', () => HttpResponse.json({ workspaces: [] })),
    );
    const { router } = renderApp(`/invitations/accept?token=${TOKEN}`);
    await userEvent.click(await screen.findByRole('button', { name: 'Join Larchloaf' }));
    await expect.poll(() => router.state.location.pathname).toBe('/orgs/org_1/workspaces');
    expect(await screen.findByText('Welcome to Larchloaf')).toBeInTheDocument();
  });
});

import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createInvitation } from '../../testing/invitation-factories';
import { InviteForm } from '../invite-form';
import { PendingInvitations } from '../pending-invitations';

const base = '*/api/organizations/org_1/invitations';

describe('InviteForm', () => {
  it('shows SEATS_EXHAUSTED with a link to the billing page', async () => {
    server.use(http.post(base, () => apiErrorResponse(409, 'SEATS_EXHAUSTED', 'All 4 paid seats are used — add seats on the billing page first')));
    renderWithProviders(<InviteForm orgId="org_1" />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'tobiah@larchloaf.test');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText(/All 4 paid seats are used — add seats on the billing page first/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to billing' })).toHaveAttribute('href', '/orgs/org_1/billing');
  });

  it('checks the e-mail before sending, then sends e-mail and role', async () => {
    let sent: unknown = null;
    server.use(
      http.post(base, async ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'CSRF token missing.');
        sent = await request.json();
        return HttpResponse.json({ invitation: createInvitation({ email: 'ilse@larchloaf.test', role: 'planner' }) }, { status: 201 });
      }),
      http.get(base, () => HttpResponse.json({ invitations: [] })),
    );
    renderWithProviders(<InviteForm orgId="org_1" />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Enter an e-mail address such as name@company.example.')).toBeInTheDocument();

    await userEvent.clear(screen.getByLabelText('E-mail'));
    await userEvent.type(screen.getByLabelText('E-mail'), 'ilse@larchloaf.test');
    await userEvent.selectOptions(screen.getByLabelText('Role'), 'planner');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Invitation sent to ilse@larchloaf.test. The link works for 7 days.')).toBeInTheDocument();
    expect(sent).toEqual({ email: 'ilse@larchloaf.test', role: 'planner' });
  });
});

describe('PendingInvitations', () => {
  it('lists open and expired invitations and revokes one', async () => {
    let invitations = [
      createInvitation({ email: 'odile@larchloaf.test', role: 'executive' }),
      createInvitation({ email: 'old@larchloaf.test', status: 'expired', expiresAt: '2026-11-20T10:00:00.000Z' }),
      createInvitation({ email: 'joined@larchloaf.test', status: 'accepted' }),
    ];
    server.use(
      http.get(base, () => HttpResponse.json({ invitations })),
      http.delete(`${base}/:id`, ({ params }) => {
        invitations = invitations.filter((i) => i.id !== params.id);
        return new HttpResponse(null, { status: 204 });
      }),
      http.get('*/api/organizations/org_1/billing', () => HttpResponse.json({})),
    );
    renderWithProviders(<PendingInvitations orgId="org_1" />);
    expect(await screen.findByText('odile@larchloaf.test')).toBeInTheDocument();
    expect(screen.getByText(/^Expired/)).toBeInTheDocument();
    expect(screen.queryByText('joined@larchloaf.test')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Revoke the invitation to odile@larchloaf.test' }));
    await screen.findByRole('button', { name: 'Resend the invitation to old@larchloaf.test' });
    await expect.poll(() => screen.queryByText('odile@larchloaf.test')).toBeNull();
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createOrganization } from '../../../../testing/data-generators';
import { hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { OrgSwitcher } from '../org-switcher';

const larchloaf = createOrganization({ id: 'org_1', name: 'Larchloaf', role: 'owner' });
const millrace = createOrganization({ id: 'org_2', name: 'Millrace Provisions', role: 'executive' });

describe('OrgSwitcher', () => {
  it('lists every membership with the role held there', async () => {
    server.use(http.get('*/api/organizations', () => HttpResponse.json({ organizations: [larchloaf, millrace] })));
    renderWithProviders(<OrgSwitcher currentOrgId="org_1" />);

    const toggle = await screen.findByRole('button', { name: /Larchloaf/ });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await userEvent.click(toggle);

    const larchloafLink = screen.getByRole('link', { name: /Larchloaf/ });
    expect(larchloafLink).toHaveAttribute('href', '/orgs/org_1/workspaces');
    expect(larchloafLink).toHaveAttribute('aria-current', 'true');
    expect(within(larchloafLink).getByText('Owner')).toBeInTheDocument();
    const millraceLink = screen.getByRole('link', { name: /Millrace Provisions/ });
    expect(millraceLink).toHaveAttribute('href', '/orgs/org_2/workspaces');
    expect(within(millraceLink).getByText('Executive')).toBeInTheDocument();
  });

  it('says so when the organizations cannot be loaded', async () => {
    server.use(
      http.get('*/api/organizations', () =>
        HttpResponse.json({ error: { code: 'INTERNAL', message: 'The server had a problem. Try again.' } }, { status: 500 }),
      ),
    );
    renderWithProviders(<OrgSwitcher />);
    await userEvent.click(screen.getByRole('button', { name: /Choose organization/ }));
    expect(await screen.findByText('The server had a problem. Try again.')).toBeInTheDocument();
  });

  it('creates an organization from the dialog and opens it', async () => {
    const organizations = [larchloaf];
    server.use(
      http.get('*/api/organizations', () => HttpResponse.json({ organizations })),
      http.post('*/api/organizations', async ({ request }) => {
        if (!hasCsrf(request)) return HttpResponse.json({ error: { code: 'CSRF_INVALID', message: 'no' } }, { status: 403 });
        const { name } = (await request.json()) as { name: string };
        const created = createOrganization({ id: 'org_3', name, role: 'owner' });
        organizations.push(created);
        return HttpResponse.json({ organization: created }, { status: 201 });
      }),
      http.get('*/api/me', () => HttpResponse.json({ user: {}, memberships: [] })),
    );
    const { router } = renderWithProviders(<OrgSwitcher currentOrgId="org_1" />, {
      routes: [{ path: '/orgs/:orgId/workspaces', element: <p>Workspaces page</p> }],
    });

    await userEvent.click(await screen.findByRole('button', { name: /Larchloaf/ }));
    await userEvent.click(screen.getByRole('button', { name: '+ Create organization' }));
    const dialog = await screen.findByRole('dialog', { name: 'Create organization' });
    await userEvent.type(within(dialog).getByLabelText('Organization name'), 'Quillport Harbour Bakes');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Create organization' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/orgs/org_3/workspaces'));
    expect(screen.getByText('Workspaces page')).toBeInTheDocument();
  });
});

describe('OrgSwitcher keyboard use', () => {
  it('closes on Escape and puts focus back on its button', async () => {
    server.use(http.get('*/api/organizations', () => HttpResponse.json({ organizations: [larchloaf] })));
    renderWithProviders(<OrgSwitcher currentOrgId="org_1" currentOrgName="Larchloaf" />);
    const toggle = screen.getByRole('button', { name: /Larchloaf/ });
    await userEvent.click(toggle);
    expect(await screen.findByRole('link', { name: /Larchloaf/ })).toBeInTheDocument();
    await userEvent.keyboard('{Escape}');
    expect(screen.queryByRole('link', { name: /Larchloaf/ })).not.toBeInTheDocument();
    expect(toggle).toHaveFocus();
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
  });
});

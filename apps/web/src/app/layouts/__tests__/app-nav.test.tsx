import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createMe, createOrganization, createWorkspace } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp, renderWithProviders } from '../../../testing/test-utils';
import { AppNav } from '../app-nav';

describe('AppNav', () => {
  it('hides the owner-only audit log from an executive', () => {
    renderWithProviders(<AppNav orgId="org_1" role="executive" />);
    const nav = screen.getByRole('navigation', { name: 'Organization' });
    expect(within(nav).getByRole('link', { name: 'Workspaces' })).toHaveAttribute('href', '/orgs/org_1/workspaces');
    expect(within(nav).getByRole('link', { name: 'Members' })).toBeInTheDocument();
    expect(within(nav).queryByRole('link', { name: 'Audit log' })).not.toBeInTheDocument();
    expect(within(nav).queryByRole('link', { name: 'Billing' })).not.toBeInTheDocument();
  });

  it('shows billing to owners only', () => {
    for (const role of ['analyst', 'planner'] as const) {
      const { unmount } = renderWithProviders(<AppNav orgId="org_1" role={role} />);
      expect(screen.queryByRole('link', { name: 'Billing' })).not.toBeInTheDocument();
      unmount();
    }
    renderWithProviders(<AppNav orgId="org_1" role="owner" />);
    expect(screen.getByRole('link', { name: 'Billing' })).toHaveAttribute('href', '/orgs/org_1/billing');
  });

  it('shows the audit log to an owner', () => {
    renderWithProviders(<AppNav orgId="org_1" role="owner" />);
    expect(screen.getByRole('link', { name: 'Audit log' })).toHaveAttribute('href', '/orgs/org_1/audit-log');
  });
});

describe('the signed-in shell', () => {
  function signedInAs(role: 'owner' | 'executive') {
    const org = createOrganization({ id: 'org_1', name: 'Larchloaf', role });
    server.use(
      http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
      http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
      http.get('*/api/organizations/org_1/workspaces', () =>
        HttpResponse.json({ workspaces: [createWorkspace({ name: 'Harbour front 2027' })] }),
      ),
    );
  }

  it('gives an executive no audit log and no "New workspace" button', async () => {
    signedInAs('executive');
    renderApp('/orgs/org_1/workspaces');
    expect(await screen.findByText('Harbour front 2027')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Workspaces' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Audit log' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New workspace' })).not.toBeInTheDocument();
  });

  it('gives an owner the audit log and the "New workspace" button', async () => {
    signedInAs('owner');
    renderApp('/orgs/org_1/workspaces');
    expect(await screen.findByText('Harbour front 2027')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Audit log' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New workspace' })).toBeInTheDocument();
  });

  it('tells an executive who opens the audit log address that it is for owners', async () => {
    signedInAs('executive');
    renderApp('/orgs/org_1/audit-log');
    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(screen.getByText('Only owners of this organization can read its audit log.')).toBeInTheDocument();
  });

  it('sends a signed-out visitor to sign-in and keeps the path to return to', async () => {
    const { router } = renderApp('/orgs/org_1/members');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe(`?redirectTo=${encodeURIComponent('/orgs/org_1/members')}`);
  });

  it('shows the not-found page for an organization the user is not in', async () => {
    signedInAs('owner');
    renderApp('/orgs/org_someone_else/workspaces');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });

  it('signs out to a plain sign-in page', async () => {
    signedInAs('owner');
    let signedOut = false;
    server.use(
      http.post('*/api/auth/sign-out', () => {
        signedOut = true;
        return new HttpResponse(null, { status: 204 });
      }),
      http.get('*/api/me', () =>
        signedOut
          ? HttpResponse.json({ error: { code: 'UNAUTHENTICATED', message: 'Sign in.' } }, { status: 401 })
          : HttpResponse.json(createMe([createOrganization({ id: 'org_1', role: 'owner' })])),
      ),
    );
    const { router } = renderApp('/orgs/org_1/workspaces');
    await userEvent.click(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(signedOut).toBe(true);
  });

  it('shows the not-found page for an unknown address', async () => {
    renderApp('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });
});

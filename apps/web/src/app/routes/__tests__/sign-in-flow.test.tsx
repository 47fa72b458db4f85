import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createMe, createMember, createOrganization } from '../../../testing/data-generators';
import { apiErrorResponse, hasCsrf } from '../../../testing/mocks/handlers';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';

describe('signing in from a guarded page', () => {
  it('returns to the page the visitor asked for', async () => {
    let signedIn = false;
    const org = createOrganization({ id: 'org_1', name: 'Larchloaf', role: 'planner' });
    server.use(
      http.get('*/api/me', () =>
        signedIn ? HttpResponse.json(createMe([org])) : apiErrorResponse(401, 'UNAUTHENTICATED', 'Sign in to continue.'),
      ),
      http.post('*/api/auth/sign-in', ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing token.');
        signedIn = true;
        return HttpResponse.json({ user: createMe([org]).user });
      }),
      http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
      http.get('*/api/organizations/org_1/members', () =>
        HttpResponse.json({ members: [createMember('planner', { name: 'Tamsin Reedholm' })] }),
      ),
    );
    const { router } = renderApp('/orgs/org_1/members');

    await userEvent.type(await screen.findByLabelText('E-mail'), 'tamsin@larchloaf.test');
    await userEvent.type(screen.getByLabelText('Password'), 'correct horse battery');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Tamsin Reedholm')).toBeInTheDocument();
    await waitFor(() => expect(router.state.location.pathname).toBe('/orgs/org_1/members'));
    expect(screen.getByRole('heading', { name: 'Members', level: 1 })).toBeInTheDocument();
  });

  it('sends a new account without an organization to the welcome page', async () => {
    let signedUp = false;
    server.use(
      http.get('*/api/me', () =>
        signedUp ? HttpResponse.json(createMe([], { name: 'Wren Applegarth' })) : apiErrorResponse(401, 'UNAUTHENTICATED', 'Sign in.'),
      ),
      http.post('*/api/auth/sign-up', () => {
        signedUp = true;
        return HttpResponse.json({ user: createMe([]).user }, { status: 201 });
      }),
      http.get('*/api/organizations', () => HttpResponse.json({ organizations: [] })),
    );
    renderApp('/sign-up');

    await userEvent.type(await screen.findByLabelText('Your name'), 'Wren Applegarth');
    await userEvent.type(screen.getByLabelText('Work e-mail'), 'wren@larchloaf.test');
    await userEvent.type(screen.getByLabelText('Password'), 'tidewater-larch-42');
    await userEvent.type(screen.getByLabelText('Password, again'), 'tidewater-larch-42');
    await userEvent.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByRole('heading', { name: 'Welcome, Wren Applegarth' })).toBeInTheDocument();
    expect(screen.getByLabelText('Organization name')).toBeInTheDocument();
  });
});

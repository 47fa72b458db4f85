import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { createWorkspace } from '../../../../testing/data-generators';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { CreateWorkspaceForm } from '../create-workspace-form';

describe('CreateWorkspaceForm', () => {
  it('asks for a name and sends nothing without one', async () => {
    const posted = vi.fn();
    server.use(http.post('*/api/organizations/org_1/workspaces', () => (posted(), HttpResponse.json({}))));
    renderWithProviders(<CreateWorkspaceForm orgId="org_1" onCreated={() => {}} />);

    await userEvent.type(await screen.findByLabelText('Name'), '   ');
    await userEvent.click(screen.getByRole('button', { name: 'Create workspace' }));

    expect(await screen.findByText('Give the study a name, e.g. “North corridor 2027”.')).toBeInTheDocument();
    expect(posted).not.toHaveBeenCalled();
  });

  it('rejects a name longer than 120 characters', async () => {
    renderWithProviders(<CreateWorkspaceForm orgId="org_1" onCreated={() => {}} />);
    await userEvent.click(await screen.findByLabelText('Name'));
    await userEvent.paste('x'.repeat(121));
    await userEvent.click(screen.getByRole('button', { name: 'Create workspace' }));
    expect(await screen.findByText('Use at most 120 characters.')).toBeInTheDocument();
  });

  it('creates the workspace and hands it to the caller', async () => {
    const bodies: unknown[] = [];
    const created = createWorkspace({ id: 'wsp_new', name: 'Harbour front 2027' });
    server.use(
      http.post('*/api/organizations/org_1/workspaces', async ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
        bodies.push(await request.json());
        return HttpResponse.json({ workspace: created }, { status: 201 });
      }),
    );
    const onCreated = vi.fn();
    renderWithProviders(<CreateWorkspaceForm orgId="org_1" onCreated={onCreated} />);

    await userEvent.type(await screen.findByLabelText('Name'), 'Harbour front 2027');
    await userEvent.type(screen.getByLabelText('Description (optional)'), 'Two candidate sites near the ferry pier.');
    await userEvent.click(screen.getByRole('button', { name: 'Create workspace' }));

    await waitFor(() => expect(onCreated).toHaveBeenCalledWith(created));
    expect(bodies).toEqual([{ name: 'Harbour front 2027', description: 'Two candidate sites near the ferry pier.' }]);
  });

  it('puts the server’s validation message on the field it names', async () => {
    server.use(
      http.post('*/api/organizations/org_1/workspaces', () =>
        apiErrorResponse(400, 'VALIDATION_FAILED', 'A workspace with this name already exists.', { field: 'name' }),
      ),
    );
    renderWithProviders(<CreateWorkspaceForm orgId="org_1" onCreated={() => {}} />);

    await userEvent.type(await screen.findByLabelText('Name'), 'North corridor 2027');
    await userEvent.click(screen.getByRole('button', { name: 'Create workspace' }));

    expect(await screen.findByText('A workspace with this name already exists.')).toBeInTheDocument();
    expect(screen.getByLabelText('Name')).toHaveAttribute('aria-invalid', 'true');
  });
});

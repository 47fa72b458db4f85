import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createUser } from '../../../../testing/data-generators';
import { SignInForm } from '../sign-in-form';

describe('SignInForm', () => {
  it('shows field errors and sends nothing when the fields are empty', async () => {
    const signIn = vi.fn();
    server.use(http.post('*/api/auth/sign-in', () => (signIn(), HttpResponse.json({}))));
    renderWithProviders(<SignInForm onSuccess={() => {}} />);

    await userEvent.click(await screen.findByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(signIn).not.toHaveBeenCalled();
  });

  it('explains a malformed e-mail address on its field', async () => {
    renderWithProviders(<SignInForm onSuccess={() => {}} />);
    await userEvent.type(await screen.findByLabelText('E-mail'), 'wren-at-larchloaf');
    await userEvent.type(screen.getByLabelText('Password'), 'whatever-long');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter an e-mail address like name@example.com.')).toBeInTheDocument();
  });

  it('shows the server’s generic message when the e-mail or password is wrong', async () => {
    server.use(
      http.post('*/api/auth/sign-in', () =>
        apiErrorResponse(401, 'INVALID_CREDENTIALS', 'E-mail or password is incorrect.'),
      ),
    );
    const onSuccess = vi.fn();
    renderWithProviders(<SignInForm onSuccess={onSuccess} />);

    await userEvent.type(await screen.findByLabelText('E-mail'), 'wren@larchloaf.test');
    await userEvent.type(screen.getByLabelText('Password'), 'not-the-password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Could not sign in');
    expect(alert).toHaveTextContent('E-mail or password is incorrect.');
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('signs in with the CSRF header and hands over to the caller', async () => {
    const received: { body: unknown; csrf: boolean }[] = [];
    server.use(
      http.post('*/api/auth/sign-in', async ({ request }) => {
        received.push({ body: await request.json(), csrf: hasCsrf(request) });
        return HttpResponse.json({ user: createUser({ email: 'wren@larchloaf.test' }) });
      }),
    );
    const onSuccess = vi.fn();
    renderWithProviders(<SignInForm onSuccess={onSuccess} />);

    await userEvent.type(await screen.findByLabelText('E-mail'), '  wren@larchloaf.test ');
    await userEvent.type(screen.getByLabelText('Password'), 'correct horse battery');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSuccess).toHaveBeenCalledTimes(1));
    expect(received).toEqual([{ body: { email: 'wren@larchloaf.test', password: 'correct horse battery' }, csrf: true }]);
  });
});

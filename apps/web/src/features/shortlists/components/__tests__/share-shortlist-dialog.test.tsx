import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createShortlist } from '../../testing/shortlist-factories';
import { ShareShortlistDialog } from '../share-shortlist-dialog';

const url = '*/api/organizations/org_1/workspaces/wsp_1/shortlists/shl_1/share';

describe('ShareShortlistDialog', () => {
  it('sends the optional message and lists who received the shortlist and when', async () => {
    let body: unknown = null;
    server.use(
      http.post(url, async ({ request }) => {
        body = await request.json();
        // The server answers with everyone it was shared with so far: one earlier, one now.
        return HttpResponse.json({
          sharedWith: [
            { userId: 'usr_cfo', name: 'Bartholomew Quince', email: 'cfo@larchloaf.test', sharedAt: '2026-12-01T08:00:00.000Z' },
            { userId: 'usr_exec', name: 'Marisol Thorncastle', email: 'exec@larchloaf.test', sharedAt: '2026-12-02T12:00:00.000Z' },
          ],
          failed: [],
        });
      }),
    );
    renderWithProviders(<ShareShortlistDialog orgId="org_1" shortlist={createShortlist()} open onClose={() => {}} />);
    const dialog = screen.getByRole('dialog', { name: 'Share with executives' });
    await userEvent.type(within(dialog).getByRole('textbox', { name: /Message/ }), '  Please decide by Thursday. ');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Send to executives' }));

    expect(await within(dialog).findByText('Sent to 1 person')).toBeInTheDocument();
    const sent = within(dialog).getAllByRole('listitem');
    expect(sent[1]).toHaveTextContent('Marisol Thorncastle (exec@larchloaf.test)');
    expect(sent[1]).toHaveTextContent(/2026/);
    expect(sent[0]).toHaveTextContent('Bartholomew Quince');
    expect(within(dialog).queryByText('Not every e-mail went out')).not.toBeInTheDocument();
    expect(body).toEqual({ message: 'Please decide by Thursday.' });
  });

  it('sends no message field when the message is empty, and names whom the e-mail did not reach', async () => {
    let body: unknown = null;
    server.use(
      http.post(url, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({
          sharedWith: [{ userId: 'usr_exec', name: 'Marisol Thorncastle', email: 'exec@larchloaf.test', sharedAt: '2026-12-02T12:00:00.000Z' }],
          failed: [{ userId: 'usr_cfo', name: 'Bartholomew Quince' }],
        });
      }),
    );
    renderWithProviders(<ShareShortlistDialog orgId="org_1" shortlist={createShortlist()} open onClose={() => {}} />);
    await userEvent.click(screen.getByRole('button', { name: 'Send to executives' }));
    expect(await screen.findByText('Not every e-mail went out')).toBeInTheDocument();
    expect(screen.getByText(/No e-mail reached Bartholomew Quince/)).toBeInTheDocument();
    expect(body).toEqual({});
  });

  it('shows the server’s error when the organization has no executive', async () => {
    server.use(
      http.post(url, () =>
        apiErrorResponse(400, 'NO_EXECUTIVES', 'This organization has no executive yet: invite an executive first (Members → Invite, role executive).', { field: 'userIds' }),
      ),
    );
    renderWithProviders(<ShareShortlistDialog orgId="org_1" shortlist={createShortlist()} open onClose={() => {}} />);
    await userEvent.click(screen.getByRole('button', { name: 'Send to executives' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Not shared');
    expect(alert).toHaveTextContent('This organization has no executive yet: invite an executive first (Members → Invite, role executive).');
    expect(screen.getByRole('button', { name: 'Send to executives' })).toBeInTheDocument();
  });

  it('lists whom it was shared with before', () => {
    renderWithProviders(
      <ShareShortlistDialog
        orgId="org_1"
        shortlist={createShortlist({ sharedWith: [{ userId: 'usr_exec', name: 'Marisol Thorncastle', email: 'exec@larchloaf.test', sharedAt: '2026-12-01T08:00:00.000Z' }] })}
        open
        onClose={() => {}}
      />,
    );
    expect(screen.getByRole('list', { name: 'Shared before' })).toHaveTextContent('Marisol Thorncastle');
  });
});

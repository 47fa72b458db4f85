import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createRun, createRunSummary, createShortlist } from '../../testing/shortlist-factories';
import { ShortlistStep } from '../shortlist-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1';

function mockRuns() {
  server.use(
    http.get(`${base}/shortlists`, () => HttpResponse.json({ shortlists: [] })),
    http.get(`${base}/scoring-runs`, () =>
      HttpResponse.json({ runs: [createRunSummary({ id: 'run_2', status: 'running', name: 'Still running' }), createRunSummary()] }),
    ),
    http.get(`${base}/scoring-runs/run_1`, () => HttpResponse.json({ run: createRun() })),
    http.get(`${base}/shortlists/shl_1`, () => HttpResponse.json({ shortlist: createShortlist() })),
  );
}

function orderedNames() {
  const list = screen.getByRole('list', { name: 'Shortlist order' });
  return within(list)
    .getAllByRole('listitem')
    .map((li) => li.querySelector('.font-medium')?.textContent);
}

describe('ShortlistStep builder', () => {
  it('builds a shortlist from a finished run: choose, reorder, note, name, and sends that body', async () => {
    mockRuns();
    let body: unknown = null;
    server.use(
      http.post(`${base}/shortlists`, async ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Reload.');
        body = await request.json();
        return HttpResponse.json({ shortlist: createShortlist() }, { status: 201 });
      }),
    );
    renderWithProviders(<ShortlistStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'New shortlist' }));

    // Only the finished run is offered.
    const runSelect = await screen.findByRole('combobox', { name: 'Scoring run' });
    expect(within(runSelect).getAllByRole('option')).toHaveLength(1);

    await userEvent.click(await screen.findByRole('checkbox', { name: 'Choose Quay Street corner' }));
    await userEvent.click(screen.getByRole('checkbox', { name: 'Choose Ropewalk Yard' }));
    await userEvent.click(screen.getByRole('checkbox', { name: 'Choose Old Mill Lane' }));
    expect(orderedNames()).toEqual(['Quay Street corner', 'Ropewalk Yard', 'Old Mill Lane']);

    // Move the last one up with the keyboard: focus stays on the moved site.
    screen.getByRole('button', { name: 'Move Old Mill Lane up' }).focus();
    await userEvent.keyboard('{Enter}');
    expect(orderedNames()).toEqual(['Quay Street corner', 'Old Mill Lane', 'Ropewalk Yard']);
    expect(screen.getByRole('button', { name: 'Move Old Mill Lane up' })).toHaveFocus();
    await userEvent.click(screen.getByRole('button', { name: 'Move Quay Street corner down' }));
    expect(orderedNames()).toEqual(['Old Mill Lane', 'Quay Street corner', 'Ropewalk Yard']);
    expect(screen.getByRole('button', { name: 'Move Old Mill Lane up' })).toBeDisabled();

    // Unticking takes a site out.
    await userEvent.click(screen.getByRole('checkbox', { name: 'Choose Ropewalk Yard' }));
    expect(orderedNames()).toEqual(['Old Mill Lane', 'Quay Street corner']);

    await userEvent.type(screen.getByRole('textbox', { name: 'Note for Quay Street corner' }), ' Ferry foot traffic ');
    await userEvent.type(screen.getByRole('textbox', { name: /Shortlist name/ }), 'Harbour candidates for the board');
    await userEvent.type(screen.getByRole('textbox', { name: /Version note/ }), 'First cut');
    await userEvent.click(screen.getByRole('button', { name: 'Save shortlist' }));

    expect(await screen.findByRole('heading', { name: 'Harbour candidates for the board' })).toBeInTheDocument();
    expect(body).toEqual({
      name: 'Harbour candidates for the board',
      scoringRunId: 'run_1',
      items: [{ siteId: 'site_mill' }, { siteId: 'site_quay', note: 'Ferry foot traffic' }],
      versionNote: 'First cut',
    });
  }, 20_000);

  it('says what is missing before sending anything', async () => {
    mockRuns();
    let posted = false;
    server.use(
      http.post(`${base}/shortlists`, () => {
        posted = true;
        return HttpResponse.json({ shortlist: createShortlist() }, { status: 201 });
      }),
    );
    renderWithProviders(<ShortlistStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'New shortlist' }));
    await screen.findByRole('checkbox', { name: 'Choose Quay Street corner' });
    await userEvent.click(screen.getByRole('button', { name: 'Save shortlist' }));
    expect(await screen.findByText('Choose at least one site from the ranking.')).toBeInTheDocument();
    expect(screen.getByText(/Give the shortlist a name/)).toBeInTheDocument();
    expect(posted).toBe(false);
  });

  it('shows the server’s reason when the save is refused', async () => {
    mockRuns();
    server.use(
      http.post(`${base}/shortlists`, () =>
        apiErrorResponse(400, 'SITES_NOT_IN_RUN', 'Site “Quay Street corner” is not a candidate of the run “Huff α 1 β 2”. Choose sites from its ranking.', { field: 'items' }),
      ),
    );
    renderWithProviders(<ShortlistStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'New shortlist' }));
    await userEvent.click(await screen.findByRole('checkbox', { name: 'Choose Quay Street corner' }));
    await userEvent.type(screen.getByRole('textbox', { name: /Shortlist name/ }), 'Board list');
    await userEvent.click(screen.getByRole('button', { name: 'Save shortlist' }));
    expect(await screen.findByText(/is not a candidate of the run/)).toBeInTheDocument();
    expect(screen.getByRole('form', { name: 'New shortlist' })).toBeInTheDocument();
  });

  it('points to step 3 when no scoring run has finished', async () => {
    server.use(
      http.get(`${base}/shortlists`, () => HttpResponse.json({ shortlists: [] })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [createRunSummary({ status: 'failed' })] })),
    );
    renderWithProviders(<ShortlistStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'New shortlist' }));
    expect(await screen.findByText('No finished scoring run yet')).toBeInTheDocument();
  });

  it('gives analysts the list without "New shortlist"', async () => {
    mockRuns();
    renderWithProviders(<ShortlistStep orgId="org_1" workspaceId="wsp_1" canWrite={false} />);
    expect(await screen.findByText(/No shortlists yet. Planners and owners build them/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New shortlist' })).not.toBeInTheDocument();
  });
});

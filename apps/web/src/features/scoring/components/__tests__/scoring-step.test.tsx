import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createFinishedScoringRun, createScoringRun, createScoringSettings } from '../../testing/scoring-factories';
import type { ScoringRunJson } from '../../types';
import { ScoringStep } from '../scoring-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1';
const surfaces = [
  { id: 'srf_2', name: 'Quartic 800 m' },
  { id: 'srf_1', name: 'larchloaf-loyalty.csv · quartic 1200 m' },
];

function summary(run: ScoringRunJson) {
  const { sites: _s, results: _r, stability: _st, sets: _x, warnings: _w, timings: _t, surface: _f, ...rest } = run;
  return rest;
}

describe('ScoringStep', () => {
  it('scores the sites against the chosen surface, follows the run and shows the ranking with units', async () => {
    let runs: ScoringRunJson[] = [];
    let posted: unknown = null;
    const answers = [createScoringRun({ status: 'running', progress: 0.4 }), createFinishedScoringRun()];
    let served = 0;
    const labels = vi.fn();
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: runs.map(summary) })),
      http.post(`${base}/scoring-runs`, async ({ request }) => {
        posted = await request.json();
        runs = [createScoringRun()];
        return HttpResponse.json({ run: createScoringRun() }, { status: 202 });
      }),
      http.get(`${base}/scoring-runs/scr_1`, () => {
        const run = answers[Math.min(served++, answers.length - 1)]!;
        runs = [run];
        return HttpResponse.json({ run });
      }),
    );
    const { unmount } = renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={surfaces} canWrite onSiteLabels={labels} />);

    expect(await screen.findByText('No scoring runs yet.')).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByLabelText('Demand surface'), 'larchloaf-loyalty.csv · quartic 1200 m');
    await userEvent.click(screen.getByRole('button', { name: 'Score sites' }));
    expect(posted).toEqual({ surfaceId: 'srf_1' });

    const bar = await screen.findByRole('progressbar', { name: /Progress of/ });
    await waitFor(() => expect(bar).toHaveAttribute('aria-valuenow', '40'));
    expect(screen.getByText('Scoring 3 candidates: 40 %')).toBeInTheDocument();

    const table = await screen.findByRole('table', { name: /Candidates ranked by net new demand/ }, { timeout: 4000 });
    const rows = within(table).getAllByRole('row');
    expect(rows[0]).toHaveTextContent('RankCandidateNet new demandcustomersCapturedcustomersCannibalizationcustomersNet newcustomersShare% of all demandWithin 1 kmcustomers');
    expect(rows[1]).toHaveTextContent('1Harbour Steps1,8402,6007601,8405.2 %3,10011,20019,800');
    expect(rows[3]).toHaveTextContent('Gull Terrace');
    expect(within(table).getByRole('columnheader', { name: 'Within 3 km customers' })).toBeInTheDocument();
    expect(screen.queryByRole('progressbar', { name: /Progress of/ })).not.toBeInTheDocument();
    expect(screen.getByText(/Leases, zoning and local rules need review by licensed professionals/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Report (XLSX)' })).toHaveAttribute('href', expect.stringMatching(/\/api\/organizations\/org_1\/workspaces\/wsp_1\/scoring-runs\/scr_1\/export\.xlsx$/));
    expect(screen.getByRole('link', { name: 'Ranking (CSV)' })).toHaveAttribute('download');
    expect(screen.getByRole('link', { name: 'Sites with scores (GeoJSON)' })).toHaveAttribute('href', expect.stringMatching(/sites\.geojson$/));
    expect(labels).toHaveBeenLastCalledWith({ ste_c1: '#1', ste_c2: '#2', ste_c3: '#3' });
    await waitFor(() => expect(screen.getByRole('list', { name: 'Scoring runs' })).toHaveTextContent('Ready'));
    unmount();
    expect(labels).toHaveBeenLastCalledWith({});
  }, 15_000);

  it('opens the explanation and the loss per own store when a candidate is chosen', async () => {
    const run = createFinishedScoringRun();
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [summary(run)] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run })),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={surfaces} canWrite={false} />);

    const name = await screen.findByRole('button', { name: 'Harbour Steps' });
    expect(screen.queryByText(/it would capture 2,600 customers/)).not.toBeInTheDocument();
    await userEvent.click(name);
    expect(name).toHaveAttribute('aria-expanded', 'true');
    expect(screen.getByText(/Harbour Steps ranks 1st: it would capture 2,600 customers/)).toBeInTheDocument();
    const losses = screen.getByRole('list', { name: 'Cannibalization by Harbour Steps' });
    const items = within(losses).getAllByRole('listitem');
    expect(items[0]).toHaveTextContent('Larchloaf Old Quay520 customers (5.8 % of its demand today)');
    expect(items[1]).toHaveTextContent('Larchloaf Ropewalk240 customers (4.0 % of its demand today)');

    await userEvent.click(screen.getByRole('button', { name: 'Tidemill Yard' }));
    expect(screen.queryByText(/Harbour Steps ranks 1st/)).not.toBeInTheDocument();
    expect(screen.getByText(/Tidemill Yard ranks 2nd/)).toBeInTheDocument();
  });

  it('gives executives the ranking and downloads without settings form, run, tick or delete controls', async () => {
    const run = createFinishedScoringRun();
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [summary(run)] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run })),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={surfaces} canWrite={false} />);
    expect(await screen.findByRole('table', { name: /Candidates ranked/ })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Report (XLSX)' })).toBeInTheDocument();
    for (const label of ['Save settings', 'Score sites', 'Check rank stability', /Score together/, /Delete/]) {
      expect(screen.queryByRole('button', { name: label })).not.toBeInTheDocument();
    }
    expect(screen.queryByRole('checkbox')).not.toBeInTheDocument();
    expect(screen.getByText(/Not checked yet/)).toBeInTheDocument();
  });

  it('says why scoring could not start', async () => {
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [] })),
      http.post(`${base}/scoring-runs`, () => apiErrorResponse(400, 'NO_CANDIDATES', 'Add at least one candidate site before scoring.')),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={surfaces} canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'Score sites' }));
    expect(await screen.findByText('Add at least one candidate site before scoring.')).toBeInTheDocument();
  });

  it('asks before deleting a run, then shows no ranking', async () => {
    let deleted = false;
    const run = createFinishedScoringRun();
    const labels = vi.fn();
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: deleted ? [] : [summary(run)] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run })),
      http.delete(`${base}/scoring-runs/scr_1`, () => {
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={surfaces} canWrite onSiteLabels={labels} />);
    await screen.findByRole('table', { name: /Candidates ranked/ });
    await userEvent.click(screen.getByRole('button', { name: `Delete ${run.name}` }));
    expect(deleted).toBe(false);
    await userEvent.click(await screen.findByRole('button', { name: 'Delete run' }));
    expect(await screen.findByText('No scoring runs yet.')).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: /Candidates ranked/ })).not.toBeInTheDocument();
    expect(labels).toHaveBeenLastCalledWith({});
  });
});

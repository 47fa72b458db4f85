import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createFinishedScoringRun, createScoringSettings, createSiteSet } from '../../testing/scoring-factories';
import type { ScoringRunJson } from '../../types';
import { ScoringStep } from '../scoring-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1';

describe('Candidate sets', () => {
  it('scores ticked candidates together and compares them with the sum of each alone', async () => {
    let current: ScoringRunJson = createFinishedScoringRun();
    let posted: unknown = null;
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [current] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run: current })),
      http.post(`${base}/scoring-runs/scr_1/sets`, async ({ request }) => {
        posted = await request.json();
        const set = createSiteSet({ name: 'North pair' });
        current = { ...current, sets: [set] };
        return HttpResponse.json({ set }, { status: 201 });
      }),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={[]} canWrite />);

    const button = await screen.findByRole('button', { name: /Score together/ });
    expect(button).toBeDisabled();
    expect(screen.getByText('No sets scored for this run yet.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('checkbox', { name: 'Score Harbour Steps together with others' }));
    expect(button).toBeDisabled();
    await userEvent.click(screen.getByRole('checkbox', { name: 'Score Tidemill Yard together with others' }));
    expect(button).toBeEnabled();
    await userEvent.type(screen.getByRole('textbox', { name: 'Set name (optional)' }), 'North pair');
    await userEvent.click(screen.getByRole('button', { name: 'Score together (2)' }));

    const card = await screen.findByRole('article', { name: 'Candidate set North pair' });
    expect(posted).toEqual({ siteIds: ['ste_c1', 'ste_c2'], name: 'North pair' });
    // Alone: 2,600 + 1,500 captured, 760 + 290 cannibalized, 1,840 + 1,210 net new.
    const rows = within(card).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('Captured3,600 customers4,100 customers-500 customers');
    expect(rows[2]).toHaveTextContent('Cannibalization980 customers1,050 customers-70 customers');
    expect(rows[3]).toHaveTextContent('Net new2,620 customers3,050 customers-430 customers');
    expect(within(card).getByText(/these sites take 500 customers from each other/)).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Score Harbour Steps together with others' })).not.toBeChecked();
  });

  it('lists saved sets for readers without the tick boxes or the button', async () => {
    const run = createFinishedScoringRun({ sets: [createSiteSet()] });
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [run] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run })),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={[]} canWrite={false} />);
    expect(await screen.findByRole('article', { name: 'Candidate set Harbour Steps + Tidemill Yard' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Score together/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('checkbox')).not.toBeInTheDocument();
  });
});

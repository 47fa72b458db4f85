import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createFinishedScoringRun, createScoringSettings, createStability } from '../../testing/scoring-factories';
import type { ScoringRunJson } from '../../types';
import { ScoringStep } from '../scoring-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1';

describe('Rank stability', () => {
  it('starts the check, follows it and shows rank ranges, the unstable flag and τ in plain words', async () => {
    let current: ScoringRunJson = createFinishedScoringRun();
    let polls = 0;
    let started = 0;
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [current] })),
      http.get(`${base}/scoring-runs/scr_1`, () => {
        if (current.stability?.status === 'running' && ++polls >= 2) current = createFinishedScoringRun({ stability: createStability() });
        return HttpResponse.json({ run: current });
      }),
      http.post(`${base}/scoring-runs/scr_1/stability`, () => {
        started += 1;
        current = createFinishedScoringRun({ stability: createStability({ status: 'running', variants: [], sites: [], finishedAt: null }) });
        return HttpResponse.json({ run: current }, { status: 202 });
      }),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={[]} canWrite />);

    await userEvent.click(await screen.findByRole('button', { name: 'Check rank stability' }));
    expect(started).toBe(1);
    expect(await screen.findByRole('progressbar', { name: 'Rank stability progress' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Check rank stability/ })).not.toBeInTheDocument();

    const table = await screen.findByRole('table', { name: 'Rank range per candidate across bandwidths' }, { timeout: 5000 });
    const gull = within(table).getByText('Gull Terrace').closest('tr')!;
    expect(gull).toHaveTextContent('Gull Terrace31–3Unstable');
    expect(within(gull).getByRole('img')).toHaveAccessibleName('Rank 1 to 3 of 3; 3 on the run\u2019s surface');
    expect(within(table).getByText('Harbour Steps').closest('tr')).not.toHaveTextContent('Unstable');
    expect(screen.getByText(/rank moves by more than 1 place when the bandwidth changes/)).toBeInTheDocument();
    expect(screen.getByText('0.5× bandwidth (600 m): τ = -0.33, largely reordered')).toBeInTheDocument();
    expect(screen.getByText('1.5× bandwidth (1,800 m): τ = 1.00, the same order')).toBeInTheDocument();
    expect(screen.queryByText(/^1× bandwidth/)).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Check rank stability again' })).toBeInTheDocument();
  }, 15_000);

  it('shows why a check failed', async () => {
    const run = createFinishedScoringRun({
      stability: createStability({ status: 'failed', error: { code: 'NO_POINTS', message: 'The customer file behind this surface was deleted.' } }),
    });
    server.use(
      http.get(`${base}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [run] })),
      http.get(`${base}/scoring-runs/scr_1`, () => HttpResponse.json({ run })),
    );
    renderWithProviders(<ScoringStep orgId="org_1" workspaceId="wsp_1" surfaces={[]} canWrite={false} />);
    expect(await screen.findByText('The customer file behind this surface was deleted.')).toBeInTheDocument();
  });
});

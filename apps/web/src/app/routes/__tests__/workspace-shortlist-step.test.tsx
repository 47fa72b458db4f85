import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createFinishedScoringRun, createScoringSettings } from '../../../features/scoring/testing/scoring-factories';
import { createShortlistSummary } from '../../../features/shortlists/testing/shortlist-factories';
import { createSite } from '../../../features/sites/testing/site-factories';
import { createMe, createOrganization, createWorkspace } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';
import type { Role } from '../../../types/api';

const ws = '*/api/organizations/org_1/workspaces/wsp_1';

function studyAs(role: Role, address = '/orgs/org_1/workspaces/wsp_1') {
  const org = createOrganization({ id: 'org_1', role });
  server.use(
    http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
    http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
    http.get(ws, () => HttpResponse.json({ workspace: createWorkspace({ id: 'wsp_1' }) })),
    http.get(`${ws}/customer-files`, () => HttpResponse.json({ customerFiles: [] })),
    http.get(`${ws}/surfaces`, () => HttpResponse.json({ surfaces: [] })),
    http.get(`${ws}/sites`, () => HttpResponse.json({ sites: [] })),
    http.get(`${ws}/scoring-runs`, () => HttpResponse.json({ runs: [] })),
    http.get(`${ws}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
    // No WebGL here: the map panel shows its load error, which this test does not look at.
    http.get('*/basemap/quillport.geojson', () => new HttpResponse('not here in this test', { status: 404 })),
    http.get(`${ws}/shortlists`, () => HttpResponse.json({ shortlists: [createShortlistSummary({ sharedAt: '2026-12-02T12:00:00.000Z' })] })),
  );
  return renderApp(address);
}

describe('the workspace page, step 4', () => {
  it('gives a planner the workspace’s shortlists with "New shortlist" and a link to the read-only page', async () => {
    studyAs('planner');
    const outline = await screen.findByRole('list', { name: 'Study steps' }, { timeout: 15_000 });
    await userEvent.click(within(outline).getByRole('button', { name: /Shortlist/ }));
    expect(await screen.findByRole('heading', { name: '4 · Shortlist' })).toBeInTheDocument();
    const list = await screen.findByRole('list', { name: 'Shortlists in this workspace' });
    expect(within(list).getByText('Harbour candidates for the board')).toBeInTheDocument();
    expect(within(list).getByRole('link', { name: 'Read-only page' })).toHaveAttribute('href', '/orgs/org_1/shortlists/shl_1');
    expect(screen.getByRole('button', { name: 'New shortlist' })).toBeInTheDocument();
  }, 20_000);

  it('opens from ?step=shortlist (the shortlist page’s "Edit in workspace") and keeps the chosen step in the address', async () => {
    const { router } = studyAs('planner', '/orgs/org_1/workspaces/wsp_1?step=shortlist');
    expect(await screen.findByRole('heading', { name: '4 · Shortlist' }, { timeout: 15_000 })).toBeInTheDocument();
    const outline = screen.getByRole('list', { name: 'Study steps' });
    expect(within(outline).getByRole('button', { name: /Shortlist/ })).toHaveAttribute('aria-current', 'step');
    await userEvent.click(within(outline).getByRole('button', { name: /Sites & scoring/ }));
    expect(await screen.findByRole('heading', { name: '3 · Sites & scoring' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?step=sites');
  }, 20_000);

  it('reports steps 3 and 4 in the outline: Scored after a finished run, Shared after a share', async () => {
    studyAs('planner');
    server.use(
      http.get(`${ws}/sites`, () => HttpResponse.json({ sites: [createSite({ id: 'site_1', kind: 'candidate' }), createSite({ id: 'site_2', kind: 'own' })] })),
      http.get(`${ws}/scoring-runs`, () => HttpResponse.json({ runs: [createFinishedScoringRun()] })),
      // The sites step (where a planner arrives) opens the newest run.
      http.get(`${ws}/scoring-runs/scr_1`, () => HttpResponse.json({ run: createFinishedScoringRun() })),
    );
    const outline = await screen.findByRole('list', { name: 'Study steps' }, { timeout: 15_000 });
    const sitesStep = within(outline).getByRole('button', { name: /Sites & scoring/ });
    expect(await within(sitesStep).findByText('Scored')).toBeInTheDocument();
    expect(sitesStep).toHaveTextContent('2 sites: 1 candidate, 1 own store, 0 competitors. 1 scoring run finished.');
    const shortlistStep = within(outline).getByRole('button', { name: /Shortlist/ });
    expect(await within(shortlistStep).findByText('Shared')).toBeInTheDocument();
    expect(shortlistStep).toHaveTextContent('1 shortlist, 1 shared.');
  }, 20_000);

  it('shows an executive the shortlists without building controls', async () => {
    studyAs('executive');
    const outline = await screen.findByRole('list', { name: 'Study steps' }, { timeout: 15_000 });
    await userEvent.click(within(outline).getByRole('button', { name: /Shortlist/ }));
    expect(await screen.findByRole('list', { name: 'Shortlists in this workspace' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New shortlist' })).not.toBeInTheDocument();
  }, 20_000);
});

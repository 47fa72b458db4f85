import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createScoringSettings } from '../../../features/scoring/testing/scoring-factories';
import { createShortlistSummary } from '../../../features/shortlists/testing/shortlist-factories';
import { createMe, createOrganization, createWorkspace } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';
import type { Role } from '../../../types/api';

const ws = '*/api/organizations/org_1/workspaces/wsp_1';

function studyAs(role: Role) {
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
  return renderApp('/orgs/org_1/workspaces/wsp_1');
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

  it('shows an executive the shortlists without building controls', async () => {
    studyAs('executive');
    const outline = await screen.findByRole('list', { name: 'Study steps' }, { timeout: 15_000 });
    await userEvent.click(within(outline).getByRole('button', { name: /Shortlist/ }));
    expect(await screen.findByRole('list', { name: 'Shortlists in this workspace' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New shortlist' })).not.toBeInTheDocument();
  }, 20_000);
});

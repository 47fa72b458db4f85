import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { createImportedCustomerFile } from '../../../features/customer-files/testing/customer-file-factories';
import type { SurfaceMapProps } from '../../../features/map/components/surface-map';
import {
  createShortlist,
  createShortlistSummary,
  createShortlistVersion,
} from '../../../features/shortlists/testing/shortlist-factories';
import { createSurface } from '../../../features/surfaces/testing/surface-factories';
import { createMe, createOrganization } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';
import type { Role } from '../../../types/api';

// The map draws with WebGL (its own tests cover it); here we check what the page hands it.
const mapProps: SurfaceMapProps[] = [];
vi.mock('../../../features/map/components/surface-map', () => ({
  SurfaceMap: (props: SurfaceMapProps) => {
    mapProps.push(props);
    return <div role="img" aria-label={`Map of ${props.surface.name}`} />;
  },
}));

vi.mock('../../../features/map/components/basemap-site-map', () => ({
  BasemapSiteMap: (props: { sites?: unknown[]; note?: string }) => <div role="img" aria-label={`Basemap with ${props.sites?.length ?? 0} sites`} />,
}));

const ws = '*/api/organizations/org_1/workspaces/wsp_1';
const planner = { id: 'usr_planner', name: 'Orrin Castellow' };

function signedInAs(role: Role) {
  mapProps.length = 0;
  const org = createOrganization({ id: 'org_1', role });
  const requestedVersions: string[] = [];
  server.use(
    http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
    http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
    http.get('*/api/organizations/org_1/shortlists', () =>
      HttpResponse.json({
        shortlists: [
          createShortlistSummary({ latestVersion: 2, sharedAt: '2026-12-02T12:00:00.000Z' }),
          createShortlistSummary({ id: 'shl_2', name: 'Riverside options', workspaceId: 'wsp_2', workspaceName: 'Riverside 2028' }),
        ],
      }),
    ),
    http.get(`${ws}/shortlists/shl_1`, ({ request }) => {
      const asked = new URL(request.url).searchParams.get('version');
      requestedVersions.push(asked ?? 'latest');
      const version = asked === '1' ? createShortlistVersion({ version: 1, versionNote: 'First cut for the board.', items: [createShortlistVersion().items[0]!] }) : createShortlistVersion({ version: 2, versionNote: 'Added Ropewalk Yard' });
      return HttpResponse.json({
        shortlist: createShortlist({
          latestVersion: 2,
          version,
          versions: [
            { version: 1, createdAt: '2026-12-02T09:15:00.000Z', createdBy: planner, versionNote: 'First cut for the board.', itemCount: 1 },
            { version: 2, createdAt: '2026-12-02T11:00:00.000Z', createdBy: planner, versionNote: 'Added Ropewalk Yard', itemCount: 2 },
          ],
        }),
      });
    }),
    http.get(`${ws}/surfaces/srf_1`, () => HttpResponse.json({ surface: createSurface({ status: 'succeeded', progress: 1, name: 'Harbour customers 2026' }) })),
    http.get(`${ws}/customer-files/cf_1`, () => HttpResponse.json({ customerFile: createImportedCustomerFile() })),
  );
  return requestedVersions;
}

describe('the read-only shortlist page', () => {
  it('shows an executive the ranked sites, key numbers, notes, explanations, caution and downloads, with no edit controls', async () => {
    signedInAs('executive');
    renderApp('/orgs/org_1/shortlists/shl_1');
    expect(await screen.findByRole('heading', { level: 1, name: 'Harbour candidates for the board' }, { timeout: 15_000 })).toBeInTheDocument();

    const table = screen.getByRole('table', { name: 'Shortlisted sites' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getByRole('rowheader').textContent)).toEqual(['Quay Street corner', 'Ropewalk Yard']);
    expect(rows[0]).toHaveTextContent('1 of 8');
    expect(rows[0]).toHaveTextContent('1,840');
    expect(rows[0]).toHaveTextContent('7.3 %');
    expect(rows[0]).toHaveTextContent('ranks 1–2');
    expect(rows[1]).toHaveTextContent('ranks 2–6');
    expect(within(rows[1]!).getByText('moves a lot')).toBeInTheDocument();
    expect(within(table).getByRole('columnheader', { name: 'Net new (customers)' })).toBeInTheDocument();
    expect(within(table).getByRole('columnheader', { name: 'Within 3 km (customers)' })).toBeInTheDocument();

    expect(screen.getByText('Corner unit with morning foot traffic from the ferry.')).toBeInTheDocument();
    expect(screen.getByText(/Ranks 1 of 8 by net new demand: captures 2,310 customers/)).toBeInTheDocument();
    expect(screen.getByText(/a quarter of it is Larchloaf Millgate’s today/)).toBeInTheDocument();
    expect(screen.getByText('Before anyone signs a lease').closest('[role="status"]')).toHaveTextContent(/estimate from a sample of customers.*licensed professionals/);

    expect(screen.getByRole('link', { name: 'Shortlist report (XLSX)' })).toHaveAttribute('href', '/api/organizations/org_1/workspaces/wsp_1/shortlists/shl_1/export.xlsx?version=2');
    expect(screen.getByRole('link', { name: 'Full ranking (CSV)' })).toHaveAttribute('href', '/api/organizations/org_1/workspaces/wsp_1/scoring-runs/run_1/ranking.csv');
    expect(screen.getByRole('link', { name: 'Scored sites (GeoJSON)' })).toHaveAttribute('href', '/api/organizations/org_1/workspaces/wsp_1/scoring-runs/run_1/sites.geojson');

    expect(await screen.findByRole('img', { name: 'Map of Harbour customers 2026' })).toBeInTheDocument();
    const last = mapProps[mapProps.length - 1]!;
    expect(last.customerFile).toBeNull();
    expect(last.role).toBe('executive');
    expect(last.scope).toEqual({ orgId: 'org_1', workspaceId: 'wsp_1' });
    expect(last.sites?.map((site) => [site.name, site.kind, site.label])).toEqual([
      ['Quay Street corner', 'candidate', '1'],
      ['Ropewalk Yard', 'candidate', '2'],
      ['Larchloaf Harbour', 'own', undefined],
      ['Crumbhall Bakery', 'competitor', undefined],
    ]);

    expect(screen.queryByRole('link', { name: 'Edit in workspace' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Share|Rename|Delete|Edit/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
    expect(screen.queryByRole('checkbox')).not.toBeInTheDocument();
  }, 20_000);

  it('hands the map the version’s weight words for an executive, who gets no customer file', async () => {
    signedInAs('executive');
    let fileRequests = 0;
    server.use(
      http.get(`${ws}/shortlists/shl_1`, () =>
        HttpResponse.json({ shortlist: createShortlist({ latestVersion: 2, version: createShortlistVersion({ version: 2, weightLabel: 'annual spend (€)' }) }) }),
      ),
      http.get(`${ws}/customer-files/:id`, () => {
        fileRequests += 1;
        return HttpResponse.json({ customerFile: createImportedCustomerFile() });
      }),
    );
    renderApp('/orgs/org_1/shortlists/shl_1');
    expect(await screen.findByRole('img', { name: 'Map of Harbour customers 2026' }, { timeout: 15_000 })).toBeInTheDocument();
    const last = mapProps[mapProps.length - 1]!;
    expect(last.customerFile).toBeNull();
    expect(last.weight).toEqual({ kind: 'other', label: 'annual spend (€)' });
    expect(fileRequests).toBe(0);
  }, 20_000);

  it('switches versions from the picker through the address', async () => {
    const requested = signedInAs('executive');
    const { router } = renderApp('/orgs/org_1/shortlists/shl_1');
    expect(await screen.findByText('Version 2 of 2', {}, { timeout: 15_000 })).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Version' }), '1');
    expect(await screen.findByText('Version 1 of 2')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?version=1');
    expect(screen.getByRole('link', { name: 'Shortlist report (XLSX)' })).toHaveAttribute('href', expect.stringContaining('export.xlsx?version=1'));
    expect(within(screen.getByRole('table', { name: 'Shortlisted sites' })).getAllByRole('row')).toHaveLength(2);
    expect(requested).toContain('1');
  }, 20_000);

  it('gives a planner an "Edit in workspace" link and the customer file’s legend words for the map', async () => {
    signedInAs('planner');
    renderApp('/orgs/org_1/shortlists/shl_1');
    const edit = await screen.findByRole('link', { name: 'Edit in workspace' }, { timeout: 15_000 });
    expect(edit).toHaveAttribute('href', '/orgs/org_1/workspaces/wsp_1?step=shortlist');
    await expect.poll(() => mapProps[mapProps.length - 1]?.customerFile?.id).toBe('cf_1');
  }, 20_000);

  it('keeps the numbers and shows the sites on the basemap when the version’s surface was deleted', async () => {
    signedInAs('executive');
    server.use(http.get(`${ws}/surfaces/srf_1`, () => HttpResponse.json({ error: { code: 'NOT_FOUND', message: 'Demand surface not found.' } }, { status: 404 })));
    renderApp('/orgs/org_1/shortlists/shl_1');
    expect(await screen.findByText('The demand surface “Harbour customers 2026” cannot be shown', {}, { timeout: 15_000 })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Basemap with 4 sites' })).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Shortlisted sites' })).toBeInTheDocument();
  }, 20_000);

  it('answers an unknown shortlist with the not-found page', async () => {
    signedInAs('executive');
    renderApp('/orgs/org_1/shortlists/shl_unknown');
    expect(await screen.findByRole('heading', { name: 'Page not found' }, { timeout: 15_000 })).toBeInTheDocument();
  }, 20_000);
});

describe('the shortlists list', () => {
  it('is where an executive lands, grouped by workspace with the shared date and a link', async () => {
    signedInAs('executive');
    const { router } = renderApp('/orgs/org_1');
    expect(await screen.findByRole('heading', { level: 1, name: 'Shortlists' }, { timeout: 15_000 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/orgs/org_1/shortlists');
    const north = screen.getByRole('region', { name: 'North corridor 2027' });
    expect(within(north).getByRole('link', { name: /Harbour candidates for the board/ })).toHaveAttribute('href', '/orgs/org_1/shortlists/shl_1');
    expect(within(north).getByText(/^Shared /)).toBeInTheDocument();
    const river = screen.getByRole('region', { name: 'Riverside 2028' });
    expect(within(river).getByText('Not shared yet')).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Organization' });
    expect(within(nav).getByRole('link', { name: 'Shortlists' })).toHaveAttribute('href', '/orgs/org_1/shortlists');
  }, 20_000);

  it('is where "/" takes an executive', async () => {
    signedInAs('executive');
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Shortlists' }, { timeout: 15_000 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/orgs/org_1/shortlists');
  }, 20_000);

  it('keeps "/" on workspaces for planners', async () => {
    signedInAs('planner');
    server.use(http.get('*/api/organizations/org_1/workspaces', () => HttpResponse.json({ workspaces: [] })));
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Workspaces' }, { timeout: 15_000 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/orgs/org_1/workspaces');
  }, 20_000);

  it('keeps workspaces as the landing page for planners', async () => {
    signedInAs('planner');
    server.use(http.get('*/api/organizations/org_1/workspaces', () => HttpResponse.json({ workspaces: [] })));
    const { router } = renderApp('/orgs/org_1');
    expect(await screen.findByRole('heading', { level: 1, name: 'Workspaces' }, { timeout: 15_000 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/orgs/org_1/workspaces');
  }, 20_000);
});

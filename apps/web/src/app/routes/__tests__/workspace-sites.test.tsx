import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { act } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { createImportedCustomerFile } from '../../../features/customer-files/testing/customer-file-factories';
import type { BasemapSiteMapProps } from '../../../features/map/components/basemap-site-map';
import type { SurfaceMapProps } from '../../../features/map/components/surface-map';
import { createScoringSettings } from '../../../features/scoring/testing/scoring-factories';
import { createSiteList } from '../../../features/sites/testing/site-factories';
import { createSurface, createSurfaceEstimate } from '../../../features/surfaces/testing/surface-factories';
import { createMe, createOrganization, createWorkspace } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';
import type { Role } from '../../../types/api';

// The maps draw with WebGL (their own tests cover that); here we check what the page hands them.
const surfaceMaps: SurfaceMapProps[] = [];
const basemapMaps: BasemapSiteMapProps[] = [];
vi.mock('../../../features/map/components/surface-map', () => ({
  SurfaceMap: (props: SurfaceMapProps) => {
    surfaceMaps.push(props);
    return <div role="img" aria-label={`Map of ${props.surface.name}`} />;
  },
}));
vi.mock('../../../features/map/components/basemap-site-map', () => ({
  BasemapSiteMap: (props: BasemapSiteMapProps) => {
    basemapMaps.push(props);
    return <div role="img" aria-label="Map of the sites" />;
  },
}));

const ws = '*/api/organizations/org_1/workspaces/wsp_1';

function studyAs(role: Role, options: { surfaces?: unknown[] } = {}) {
  surfaceMaps.length = 0;
  basemapMaps.length = 0;
  const org = createOrganization({ id: 'org_1', role });
  const siteRequests = vi.fn();
  const patches: unknown[] = [];
  server.use(
    http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
    http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
    http.get(ws, () => HttpResponse.json({ workspace: createWorkspace({ id: 'wsp_1' }) })),
    http.get(`${ws}/customer-files`, () => HttpResponse.json({ customerFiles: [createImportedCustomerFile()] })),
    http.get(`${ws}/customer-files/cf_1`, () => HttpResponse.json({ customerFile: createImportedCustomerFile() })),
    http.get(`${ws}/surfaces`, () => HttpResponse.json({ surfaces: options.surfaces ?? [] })),
    http.get(`${ws}/surfaces/srf_1`, () => HttpResponse.json({ surface: (options.surfaces ?? [])[0] })),
    http.post(`${ws}/surfaces/estimate`, () => HttpResponse.json(createSurfaceEstimate())),
    http.get(`${ws}/sites`, () => (siteRequests(), HttpResponse.json({ sites: createSiteList() }))),
    http.get(`${ws}/scoring-runs`, () => HttpResponse.json({ runs: [] })),
    http.get(`${ws}/scoring-settings`, () => HttpResponse.json({ settings: createScoringSettings() })),
    http.get(`${ws}/shortlists`, () => HttpResponse.json({ shortlists: [] })),
    http.patch(`${ws}/sites/:id`, async ({ request, params }) => {
      const body = await request.json();
      patches.push({ id: params.id, body });
      return HttpResponse.json({ site: { ...createSiteList().find((s) => s.id === params.id), ...(body as object) } });
    }),
  );
  renderApp('/orgs/org_1/workspaces/wsp_1');
  return { siteRequests, patches };
}

const lastBasemap = () => basemapMaps.at(-1)!;

describe('the workspace study page, step 3', () => {
  it('opens the sites step for a planner, with the sites on the basemap and the step’s state in the outline', async () => {
    studyAs('planner');
    expect(await screen.findByRole('heading', { name: '3 · Sites & scoring' }, { timeout: 15_000 })).toBeInTheDocument();
    const outline = screen.getByRole('list', { name: 'Study steps' });
    expect(await within(outline).findByText('4 sites')).toBeInTheDocument();
    expect(within(outline).getByText('4 sites: 2 candidates, 1 own store, 1 competitor.')).toBeInTheDocument();
    await waitFor(() => expect(lastBasemap().sites?.map((s) => s.name)).toEqual(['Quay corner', 'Lantern Yard', 'Harbour Row', 'Crumbhall Mill Street']));
    expect(lastBasemap().sites?.[2]).toEqual({ id: 'site_2', name: 'Harbour Row', kind: 'own', lon: -38.47, lat: 44.49, label: undefined });
    expect(lastBasemap().onSiteMove).toBeTypeOf('function');
    expect(lastBasemap().onMapClickAdd).toBeUndefined();
  }, 20_000);

  it('places a new site by clicking the map once “Add on map” is on', async () => {
    studyAs('planner');
    await userEvent.click(await screen.findByRole('button', { name: 'Add on map' }, { timeout: 15_000 }));
    await waitFor(() => expect(lastBasemap().onMapClickAdd).toBeTypeOf('function'));
    act(() => lastBasemap().onMapClickAdd!({ lon: -38.4911, lat: 44.5077 }));
    const form = await screen.findByRole('form', { name: 'New site' });
    expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.4911');
    expect(within(form).getByLabelText('Latitude')).toHaveValue('44.5077');
  }, 20_000);

  it('selects a site from the list or the map and shows it in the inspector; a drag on the map moves it', async () => {
    const { patches } = studyAs('planner', { surfaces: [createSurface({ status: 'succeeded' })] });
    await userEvent.click(await screen.findByRole('button', { name: /^Harbour Row/ }, { timeout: 15_000 }));
    const inspector = await screen.findByRole('region', { name: 'Site Harbour Row' });
    expect(within(inspector).getByText('Lease renews in 2028.')).toBeInTheDocument();
    expect(within(inspector).getByText('180 m² sales floor')).toBeInTheDocument();
    await waitFor(() => expect(surfaceMaps.at(-1)?.selectedSiteId).toBe('site_2'));

    act(() => surfaceMaps.at(-1)!.onSiteSelect!('site_3'));
    expect(await screen.findByRole('region', { name: 'Site Crumbhall Mill Street' })).toBeInTheDocument();

    act(() => surfaceMaps.at(-1)!.onSiteMove!('site_3', { lon: -38.44123456789, lat: 44.5512 }));
    await waitFor(() => expect(patches).toEqual([{ id: 'site_3', body: { lon: -38.4412346, lat: 44.5512 } }]));
  }, 20_000);

  it('gives analysts the sites to view, not to move or add', async () => {
    studyAs('analyst');
    await userEvent.click(await screen.findByRole('button', { name: /Sites/ }, { timeout: 15_000 }));
    expect(await screen.findByText('Quay corner')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New site' })).not.toBeInTheDocument();
    await waitFor(() => expect(lastBasemap().sites).toHaveLength(4));
    expect(lastBasemap().onSiteMove).toBeUndefined();
    expect(lastBasemap().onMapClickAdd).toBeUndefined();
  }, 20_000);

  it('points executives to the shortlists and never asks for the sites', async () => {
    const { siteRequests } = studyAs('executive', { surfaces: [createSurface({ status: 'succeeded' })] });
    await userEvent.click(await screen.findByRole('button', { name: /Sites/ }, { timeout: 15_000 }));
    expect(await screen.findByRole('link', { name: 'Open the shortlists' })).toBeInTheDocument();
    expect(surfaceMaps.at(-1)?.sites).toBeUndefined();
    expect(siteRequests).not.toHaveBeenCalled();
  }, 20_000);

  it('opens step 4 with a way to the organization’s shortlists', async () => {
    studyAs('planner');
    await userEvent.click(await screen.findByRole('button', { name: /Shortlist/ }, { timeout: 15_000 }));
    expect(await screen.findByRole('heading', { name: '4 · Shortlist' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'All shortlists of the organization' })).toHaveAttribute('href', '/orgs/org_1/shortlists');
  }, 20_000);
});

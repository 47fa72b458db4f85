import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { act, useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { useUpdateSite } from '../../api/update-site';
import { createSite, createSiteList } from '../../testing/site-factories';
import type { Site, SitePick } from '../../types';
import { SitesStep, type SitesStepProps } from '../sites-step';

const url = '*/api/organizations/org_1/workspaces/wsp_1/sites';

/** A tiny in-memory sites API: list, create, edit, delete; records every write body. */
function sitesApi(initial: Site[] = createSiteList()) {
  let sites = [...initial];
  const writes: Array<{ method: string; id?: string; body?: unknown }> = [];
  server.use(
    http.get(url, () => HttpResponse.json({ sites })),
    http.post(url, async ({ request }) => {
      if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
      const body = (await request.json()) as Partial<Site>;
      writes.push({ method: 'POST', body });
      const site = createSite({ ...body, id: 'site_new' });
      sites = [...sites, site];
      return HttpResponse.json({ site }, { status: 201 });
    }),
    http.patch(`${url}/:id`, async ({ request, params }) => {
      const body = (await request.json()) as Partial<Site>;
      writes.push({ method: 'PATCH', id: String(params.id), body });
      sites = sites.map((s) => (s.id === params.id ? { ...s, ...body } : s));
      return HttpResponse.json({ site: sites.find((s) => s.id === params.id) });
    }),
    http.delete(`${url}/:id`, ({ params }) => {
      writes.push({ method: 'DELETE', id: String(params.id) });
      sites = sites.filter((s) => s.id !== params.id);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return writes;
}

function renderStep(overrides: Partial<SitesStepProps> = {}) {
  const props: SitesStepProps = {
    orgId: 'org_1',
    workspaceId: 'wsp_1',
    canRead: true,
    canWrite: true,
    selectedId: null,
    onSelect: vi.fn(),
    pickOnMap: false,
    onPickOnMapChange: vi.fn(),
    picked: null,
    ...overrides,
  };
  const result = renderWithProviders(<SitesStep {...props} />);
  return { ...result, props };
}

describe('SitesStep', () => {
  it('lists the sites grouped by kind with a count per group', async () => {
    sitesApi();
    renderStep();
    const candidates = await screen.findByRole('region', { name: /Candidate sites/ });
    expect(within(candidates).getByText('2')).toBeInTheDocument();
    expect(within(candidates).getByText('Quay corner')).toBeInTheDocument();
    expect(within(candidates).getByText('Lantern Yard')).toBeInTheDocument();
    const own = screen.getByRole('region', { name: /Own stores/ });
    expect(within(own).getByText('Harbour Row')).toBeInTheDocument();
    expect(within(own).getByText('180 m² sales floor')).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: /Competitor stores/ })).getByText('1')).toBeInTheDocument();
  });

  it('adds a site with the form, each field explained, and selects it', async () => {
    const writes = sitesApi();
    const { props } = renderStep();
    await userEvent.click(await screen.findByRole('button', { name: 'New site' }));
    const form = screen.getByRole('form', { name: 'New site' });
    expect(within(form).getByText(/all sites of a study must use the same measure/)).toBeInTheDocument();
    // The study's unit is offered for the new site.
    expect(within(form).getByLabelText('Attractiveness unit (optional)')).toHaveValue('m² sales floor');
    await userEvent.selectOptions(within(form).getByLabelText('Kind'), 'competitor');
    await userEvent.type(within(form).getByLabelText('Name'), 'Oven & Oar, Wharf Street');
    await userEvent.type(within(form).getByLabelText('Longitude'), '-38.4821');
    await userEvent.type(within(form).getByLabelText('Latitude'), '44.5102');
    await userEvent.type(within(form).getByLabelText('Attractiveness'), '150');
    await userEvent.type(within(form).getByLabelText('Notes (optional)'), 'Opened in spring.');
    await userEvent.click(within(form).getByRole('button', { name: 'Add site' }));
    await waitFor(() => expect(props.onSelect).toHaveBeenCalledWith('site_new'));
    expect(writes).toEqual([
      {
        method: 'POST',
        body: {
          kind: 'competitor',
          name: 'Oven & Oar, Wharf Street',
          lon: -38.4821,
          lat: 44.5102,
          attractiveness: 150,
          attractivenessLabel: 'm² sales floor',
          notes: 'Opened in spring.',
        },
      },
    ]);
    expect(await within(screen.getByRole('region', { name: /Competitor stores/ })).findByText('Oven & Oar, Wharf Street')).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'New site' })).not.toBeInTheDocument();
  });

  it('refuses a latitude out of range and a missing name before sending', async () => {
    const writes = sitesApi();
    renderStep();
    await userEvent.click(await screen.findByRole('button', { name: 'New site' }));
    await userEvent.type(screen.getByLabelText('Longitude'), '-38.5');
    await userEvent.type(screen.getByLabelText('Latitude'), '144.5');
    await userEvent.type(screen.getByLabelText('Attractiveness'), '0');
    await userEvent.click(screen.getByRole('button', { name: 'Add site' }));
    expect(await screen.findByText('Give the site a name, e.g. “Quay corner”.')).toBeInTheDocument();
    expect(screen.getByText('Enter the latitude in decimal degrees between −90 and 90, or click the map.')).toBeInTheDocument();
    expect(screen.getByText(/Enter a number greater than 0/)).toBeInTheDocument();
    expect(writes).toEqual([]);
  });

  it('shows the server’s field error on the field', async () => {
    sitesApi();
    server.use(http.post(url, () => apiErrorResponse(400, 'VALIDATION_FAILED', 'name: must be at most 120 characters', { field: 'name' })));
    renderStep();
    await userEvent.click(await screen.findByRole('button', { name: 'New site' }));
    await userEvent.type(screen.getByLabelText('Name'), 'Quay corner');
    await userEvent.type(screen.getByLabelText('Longitude'), '-38.5');
    await userEvent.type(screen.getByLabelText('Latitude'), '44.5');
    await userEvent.type(screen.getByLabelText('Attractiveness'), '100');
    await userEvent.click(screen.getByRole('button', { name: 'Add site' }));
    expect(await screen.findByText('name: must be at most 120 characters')).toBeInTheDocument();
  });

  it('opens the form at a position clicked on the map, and a second click moves it', async () => {
    sitesApi();
    let mapClick: (pick: SitePick) => void = () => undefined;
    function WithMap() {
      const [picked, setPicked] = useState<SitePick | null>(null);
      mapClick = setPicked;
      return <SitesStep orgId="org_1" workspaceId="wsp_1" canRead canWrite selectedId={null} onSelect={() => {}} pickOnMap onPickOnMapChange={() => {}} picked={picked} />;
    }
    renderWithProviders(<WithMap />);
    expect(await screen.findByRole('button', { name: 'Add on map: on' })).toHaveAttribute('aria-pressed', 'true');
    const at = (pick: SitePick) => act(() => mapClick(pick));
    at({ lon: -38.4987654321, lat: 44.5123456789, seq: 1 });
    const form = await screen.findByRole('form', { name: 'New site' });
    expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.498765');
    expect(within(form).getByLabelText('Latitude')).toHaveValue('44.512346');
    at({ lon: -38.41, lat: 44.6, seq: 2 });
    await waitFor(() => expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.41'));
    expect(within(form).getByLabelText('Latitude')).toHaveValue('44.6');
  });

  it('switches “Add on map” through the route', async () => {
    sitesApi();
    const { props } = renderStep();
    await userEvent.click(await screen.findByRole('button', { name: 'Add on map' }));
    expect(props.onPickOnMapChange).toHaveBeenCalledWith(true);
  });

  it('edits a site (moving it by typing new coordinates)', async () => {
    const writes = sitesApi();
    renderStep();
    await userEvent.click(await screen.findByRole('button', { name: 'Edit Harbour Row' }));
    const form = screen.getByRole('form', { name: 'Edit Harbour Row' });
    expect(within(form).getByLabelText('Kind')).toHaveValue('own');
    expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.47');
    await userEvent.clear(within(form).getByLabelText('Latitude'));
    await userEvent.type(within(form).getByLabelText('Latitude'), '44.4912');
    await userEvent.clear(within(form).getByLabelText('Attractiveness'));
    await userEvent.type(within(form).getByLabelText('Attractiveness'), '210');
    await userEvent.click(within(form).getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(writes).toHaveLength(1));
    expect(writes[0]).toMatchObject({ method: 'PATCH', id: 'site_2', body: { kind: 'own', name: 'Harbour Row', lon: -38.47, lat: 44.4912, attractiveness: 210 } });
    expect(await screen.findByText('210 m² sales floor')).toBeInTheDocument();
  });

  it('follows a site dragged on the map while its edit form is open, and saves the new position', async () => {
    const writes = sitesApi();
    // The map's drag goes through the same mutation outside the step (the route owns the map).
    function MapDrag() {
      const move = useUpdateSite('org_1', 'wsp_1');
      return (
        <button type="button" onClick={() => move.mutate({ siteId: 'site_2', changes: { lon: -38.4601, lat: 44.4955 } })}>
          Drag Harbour Row
        </button>
      );
    }
    renderWithProviders(
      <>
        <SitesStep orgId="org_1" workspaceId="wsp_1" canRead canWrite selectedId={null} onSelect={vi.fn()} pickOnMap={false} onPickOnMapChange={vi.fn()} picked={null} />
        <MapDrag />
      </>,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Edit Harbour Row' }));
    const form = screen.getByRole('form', { name: 'Edit Harbour Row' });
    expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.47');
    await userEvent.type(within(form).getByLabelText('Notes (optional)'), ' Back door on Rope Lane.');
    await userEvent.click(screen.getByRole('button', { name: 'Drag Harbour Row' }));
    await waitFor(() => expect(within(form).getByLabelText('Longitude')).toHaveValue('-38.4601'));
    expect(within(form).getByLabelText('Latitude')).toHaveValue('44.4955');
    expect(within(form).getByLabelText('Notes (optional)')).toHaveValue('Lease renews in 2028. Back door on Rope Lane.');
    await userEvent.click(within(form).getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(writes).toHaveLength(2));
    expect(writes[1]).toMatchObject({ method: 'PATCH', id: 'site_2', body: { lon: -38.4601, lat: 44.4955, notes: 'Lease renews in 2028. Back door on Rope Lane.' } });
  });

  it('deletes a site only after confirming', async () => {
    const writes = sitesApi();
    const { props } = renderStep({ selectedId: 'site_3' });
    await userEvent.click(await screen.findByRole('button', { name: 'Delete Crumbhall Mill Street' }));
    const dialog = screen.getByRole('dialog', { name: 'Delete this site?' });
    expect(within(dialog).getByText(/Competitor store “Crumbhall Mill Street” is removed/)).toBeInTheDocument();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(writes).toEqual([]);
    await userEvent.click(screen.getByRole('button', { name: 'Delete Crumbhall Mill Street' }));
    await userEvent.click(within(screen.getByRole('dialog', { name: 'Delete this site?' })).getByRole('button', { name: 'Delete site' }));
    await waitFor(() => expect(writes).toEqual([{ method: 'DELETE', id: 'site_3' }]));
    await waitFor(() => expect(screen.queryByText('Crumbhall Mill Street')).not.toBeInTheDocument());
    expect(props.onSelect).toHaveBeenCalledWith(null);
  });

  it('selects a site from the list', async () => {
    sitesApi();
    const { props } = renderStep();
    await userEvent.click(await screen.findByRole('button', { name: /^Lantern Yard/ }));
    expect(props.onSelect).toHaveBeenCalledWith('site_4');
  });

  it('warns when sites use different attractiveness units', async () => {
    sitesApi([createSite(), createSite({ id: 'site_9', name: 'Ferry steps', attractivenessLabel: 'score 1–10' })]);
    renderStep();
    expect(await screen.findByText('The sites use different attractiveness units')).toBeInTheDocument();
  });

  it('shows analysts the list without add, import, edit or delete', async () => {
    sitesApi();
    renderStep({ canWrite: false });
    expect(await screen.findByText('Quay corner')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add site' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Import sites' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Edit / })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Delete / })).not.toBeInTheDocument();
  });

  it('points executives to the shortlists and never asks for the sites', async () => {
    const asked = vi.fn();
    server.use(http.get(url, () => (asked(), HttpResponse.json({ sites: [] }))));
    renderStep({ canRead: false, canWrite: false });
    expect(await screen.findByRole('link', { name: 'Open the shortlists' })).toHaveAttribute('href', '/orgs/org_1/shortlists');
    expect(screen.queryByText('Quay corner')).not.toBeInTheDocument();
    expect(asked).not.toHaveBeenCalled();
  });
});

import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createImportedCustomerFile } from '../../../features/customer-files/testing/customer-file-factories';
import { createSurface, createSurfaceEstimate } from '../../../features/surfaces/testing/surface-factories';
import { createMe, createOrganization, createWorkspace } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';
import type { Role } from '../../../types/api';

const ws = '*/api/organizations/org_1/workspaces/wsp_1';

function studyAs(role: Role, options: { files?: unknown[]; surfaces?: unknown[] } = {}) {
  const org = createOrganization({ id: 'org_1', role });
  server.use(
    http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
    http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
    http.get(ws, () => HttpResponse.json({ workspace: createWorkspace({ id: 'wsp_1' }) })),
    http.get(`${ws}/customer-files`, () => HttpResponse.json({ customerFiles: options.files ?? [] })),
    http.get(`${ws}/customer-files/cf_1`, () => HttpResponse.json({ customerFile: createImportedCustomerFile() })),
    http.get(`${ws}/surfaces`, () => HttpResponse.json({ surfaces: options.surfaces ?? [] })),
    http.get(`${ws}/sites`, () => HttpResponse.json({ sites: [] })),
    // The outline reads the runs and shortlists for steps 3 and 4.
    http.get(`${ws}/scoring-runs`, () => HttpResponse.json({ runs: [] })),
    http.get(`${ws}/shortlists`, () => HttpResponse.json({ shortlists: [] })),
    http.get(`${ws}/surfaces/srf_1`, () => HttpResponse.json({ surface: (options.surfaces ?? [])[0] })),
    http.post(`${ws}/surfaces/estimate`, () => HttpResponse.json(createSurfaceEstimate())),
  );
  return renderApp('/orgs/org_1/workspaces/wsp_1');
}

describe('the workspace study page', () => {
  it('opens the customers step for an analyst of a new study, with the upload', async () => {
    studyAs('analyst');
    // The first render loads the lazy route modules, which takes a while on a shared machine.
    expect(await screen.findByRole('heading', { name: '1 · Customers' }, { timeout: 15_000 })).toBeInTheDocument();
    expect(screen.getByLabelText('Choose a CSV or XLSX file')).toBeInTheDocument();
    const outline = screen.getByRole('list', { name: 'Study steps' });
    expect(within(outline).getByRole('button', { name: /Customers/ })).toHaveAttribute('aria-current', 'step');
  }, 20_000);

  it('moves on to the surface step once a file is imported, and reports both steps’ states', async () => {
    studyAs('analyst', { files: [createImportedCustomerFile()], surfaces: [createSurface({ status: 'running', progress: 0.4 })] });
    expect(await screen.findByRole('heading', { name: '2 · Demand surface' })).toBeInTheDocument();
    const outline = screen.getByRole('list', { name: 'Study steps' });
    expect(within(outline).getByText('Imported')).toBeInTheDocument();
    expect(within(outline).getByText(/488 customers/)).toBeInTheDocument();
    expect(await within(outline).findByText('Running')).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Start (1 credit)' })).toBeInTheDocument();

    await userEvent.click(within(outline).getByRole('button', { name: /Customers/ }));
    expect(await screen.findByRole('heading', { name: '1 · Customers' })).toBeInTheDocument();
  });

  it('shows an executive the study without upload or build controls', async () => {
    studyAs('executive', { files: [createImportedCustomerFile()], surfaces: [createSurface({ status: 'running', progress: 0.4 })] });
    expect(await screen.findByRole('heading', { name: '2 · Demand surface' })).toBeInTheDocument();
    expect(await screen.findByText('Running: 40 %')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Start/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Cancel' })).not.toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: /Customers/ }));
    expect(await screen.findByRole('region', { name: 'Validation report' })).toBeInTheDocument();
    expect(screen.queryByLabelText('Choose a CSV or XLSX file')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Delete / })).not.toBeInTheDocument();
  });
});

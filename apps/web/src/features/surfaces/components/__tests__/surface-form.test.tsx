import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createSurface, createSurfaceEstimate, createSurfaceSource } from '../../testing/surface-factories';
import type { SurfaceCreateBody } from '../../types';
import { SurfaceForm } from '../surface-form';

const base = '*/api/organizations/org_1/workspaces/wsp_1/surfaces';

describe('SurfaceForm', () => {
  it('shows the live estimate: bandwidth with sd and radius, cell size, grid, credits and warnings', async () => {
    const bodies: SurfaceCreateBody[] = [];
    server.use(
      http.post(`${base}/estimate`, async ({ request }) => {
        bodies.push((await request.json()) as SurfaceCreateBody);
        return HttpResponse.json(createSurfaceEstimate({ warnings: ['The bandwidth of 300 m is below 500 m.'] }));
      }),
    );
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} onCreated={() => {}} />);

    const estimate = await screen.findByRole('region', { name: 'Estimate' });
    expect(within(estimate).getByText('Kernel radius').closest('dl')).toHaveTextContent('1,200 m');
    expect(within(estimate).getByText('Equivalent Gaussian sd').closest('dl')).toHaveTextContent('432 m');
    expect(within(estimate).getByText('Grid').closest('dl')).toHaveTextContent('420 × 380cells');
    expect(within(estimate).getByText('Cost').closest('dl')).toHaveTextContent('1credit');
    expect(within(estimate).getByText('The bandwidth of 300 m is below 500 m.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start (1 credit)' })).toBeEnabled();
    expect(screen.getByText(/check leases, zoning and local rules with licensed professionals/)).toBeInTheDocument();
    expect(bodies[0]).toEqual({
      customerFileId: 'cf_1',
      kernel: 'quartic',
      bandwidth: { mode: 'rule', rule: 'normal-reference' },
      studyArea: { type: 'extent' },
      edgeCorrection: false,
      adaptive: false,
      unit: 'km2',
      method: 'auto',
    });
  });

  it('offers the engine’s suggested cell size when the grid is too large, and re-estimates with it', async () => {
    const cellSizes: (number | undefined)[] = [];
    server.use(
      http.post(`${base}/estimate`, async ({ request }) => {
        const body = (await request.json()) as SurfaceCreateBody;
        cellSizes.push(body.cellSize);
        if (body.cellSize === 5) {
          return HttpResponse.json(
            {
              error: {
                code: 'GRID_TOO_LARGE',
                message: 'A 5 m cell size makes a 10,080 × 9,120 grid (91.9 million cells); the limit is 16.8 million. Use a cell size of at least 75 m.',
                field: 'cellSize',
                details: { cells: 91_929_600, maxCells: 16_777_216, suggestedCellSize: 75 },
              },
            },
            { status: 400 },
          );
        }
        return HttpResponse.json(createSurfaceEstimate());
      }),
    );
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} onCreated={() => {}} />);
    await screen.findByRole('region', { name: 'Estimate' });

    await userEvent.type(screen.getByLabelText('Cell size (m)'), '5');
    expect(await screen.findByText(/Use a cell size of at least 75 m/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start' })).toBeDisabled();

    await userEvent.click(screen.getByRole('button', { name: 'Use 75 m' }));
    expect(screen.getByLabelText('Cell size (m)')).toHaveValue('75');
    expect(await screen.findByRole('button', { name: 'Start (1 credit)' })).toBeEnabled();
    expect(cellSizes).toContain(75);
  });

  it('shows the Gaussian sd and kernel radius beside a bandwidth set by hand', async () => {
    server.use(
      http.post(`${base}/estimate`, async ({ request }) => {
        const body = (await request.json()) as SurfaceCreateBody;
        if (body.bandwidth.mode === 'value') {
          return HttpResponse.json(
            createSurfaceEstimate({ bandwidth: { value: 800, rule: 'value', explanation: '800 m radius, set by hand', gaussianSd: 288, radius: 800 } }),
          );
        }
        return HttpResponse.json(createSurfaceEstimate());
      }),
    );
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} onCreated={() => {}} />);
    await userEvent.click(await screen.findByLabelText('Set by hand'));
    await userEvent.type(screen.getByLabelText('Bandwidth (m)'), '800');
    expect(await screen.findByText('Gaussian sd 288 m · kernel radius 800 m')).toBeInTheDocument();
  });

  it('starts the run with the chosen settings and hands it over', async () => {
    const created: SurfaceCreateBody[] = [];
    server.use(
      http.post(`${base}/estimate`, () => HttpResponse.json(createSurfaceEstimate())),
      http.post(base, async ({ request }) => {
        created.push((await request.json()) as SurfaceCreateBody);
        return HttpResponse.json({ surface: createSurface() }, { status: 201 });
      }),
      http.get(base, () => HttpResponse.json({ surfaces: [createSurface()] })),
    );
    const onCreated = vi.fn();
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} onCreated={onCreated} />);
    await userEvent.selectOptions(await screen.findByLabelText('Kernel'), 'epanechnikov');
    await userEvent.selectOptions(screen.getByLabelText('Rule'), 'likelihood-cv');
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'sqmi');
    await userEvent.click(screen.getByLabelText(/Edge correction/));
    await userEvent.click(await screen.findByRole('button', { name: 'Start (1 credit)' }));

    await waitFor(() => expect(onCreated).toHaveBeenCalled());
    expect(created[0]).toMatchObject({
      kernel: 'epanechnikov',
      bandwidth: { mode: 'rule', rule: 'likelihood-cv' },
      unit: 'sqmi',
      edgeCorrection: true,
    });
  });

  it('shows why the server refused to start, e.g. too few credits', async () => {
    server.use(
      http.post(`${base}/estimate`, () => HttpResponse.json(createSurfaceEstimate())),
      http.post(base, () => apiErrorResponse(402, 'INSUFFICIENT_CREDITS', 'This surface costs 1 credit; the organization has 0. Buy credits in Billing.')),
    );
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} onCreated={() => {}} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Start (1 credit)' }));
    expect(await screen.findByText('This surface costs 1 credit; the organization has 0. Buy credits in Billing.')).toBeInTheDocument();
  });

  it('asks for an imported customer file first when there is none', () => {
    renderWithProviders(<SurfaceForm orgId="org_1" workspaceId="wsp_1" sources={[]} onCreated={() => {}} />);
    expect(screen.getByText(/Import a customer file in step 1 first/)).toBeInTheDocument();
  });
});

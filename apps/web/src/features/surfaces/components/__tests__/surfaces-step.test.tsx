import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createSurface, createSurfaceSource } from '../../testing/surface-factories';
import { SurfacesStep } from '../surfaces-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1/surfaces';

describe('SurfacesStep', () => {
  it('moves the progress bar as polling reports 30 % and then the finished run', async () => {
    const answers = [
      createSurface({ status: 'running', progress: 0.3, startedAt: '2026-12-01T10:00:01.000Z' }),
      createSurface({
        status: 'succeeded',
        progress: 1,
        startedAt: '2026-12-01T10:00:01.000Z',
        finishedAt: '2026-12-01T10:00:05.000Z',
        thresholds: [
          { percent: 50, threshold: 812.5, areaKm2: 6.2, clipped: false },
          { percent: 75, threshold: 402.1, areaKm2: 14.8, clipped: false },
          { percent: 90, threshold: 150.3, areaKm2: 29.4, clipped: true },
        ],
      }),
    ];
    let served = 0;
    server.use(
      http.get(base, () => HttpResponse.json({ surfaces: [createSurface()] })),
      http.get(`${base}/srf_1`, () => HttpResponse.json({ surface: answers[Math.min(served++, answers.length - 1)] })),
    );
    renderWithProviders(
      <SurfacesStep orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} canWrite={false} selectedId={null} onSelect={() => {}} />,
    );

    const bar = await screen.findByRole('progressbar', { name: /Progress of/ });
    await waitFor(() => expect(bar).toHaveAttribute('aria-valuenow', '30'));
    expect(screen.getByText('Running: 30 %')).toBeInTheDocument();

    expect(await screen.findByText('Ready', {}, { timeout: 4000 })).toBeInTheDocument();
    expect(screen.queryByRole('progressbar', { name: /Progress of/ })).not.toBeInTheDocument();
    expect(screen.getByText('90 %').closest('tr')).toHaveTextContent('29.4');
    expect(screen.getByText(/took 4 s/)).toBeInTheDocument();
  }, 15_000);

  it('shows the error of a failed run and lets an analyst retry it', async () => {
    let retried = false;
    const failed = createSurface({ status: 'failed', progress: 0.6, error: { code: 'WORKER_LOST', message: 'The worker stopped while computing; your credits were released.' } });
    server.use(
      http.get(base, () => HttpResponse.json({ surfaces: [retried ? createSurface() : failed] })),
      http.get(`${base}/srf_1`, () => HttpResponse.json({ surface: retried ? createSurface() : failed })),
      http.post(`${base}/estimate`, () => HttpResponse.json({ error: { code: 'X', message: 'not needed' } }, { status: 400 })),
      http.post(`${base}/srf_1/retry`, () => {
        retried = true;
        return HttpResponse.json({ surface: createSurface() });
      }),
    );
    renderWithProviders(
      <SurfacesStep orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} canWrite selectedId={null} onSelect={() => {}} />,
    );
    expect(await screen.findByText('The worker stopped while computing; your credits were released.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Queued: waiting for a worker')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Cancel' })).toBeInTheDocument();
  });

  it('gives executives the runs without the form or run actions', async () => {
    server.use(
      http.get(base, () => HttpResponse.json({ surfaces: [createSurface({ status: 'cancelled', progress: 0.2 })] })),
      http.get(`${base}/srf_1`, () => HttpResponse.json({ surface: createSurface({ status: 'cancelled', progress: 0.2 }) })),
    );
    renderWithProviders(
      <SurfacesStep orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} canWrite={false} selectedId={null} onSelect={() => {}} />,
    );
    expect(await screen.findByText('Cancelled at 20 %')).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'New demand surface' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Start/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Retry' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete' })).not.toBeInTheDocument();
  });

  it('asks before deleting a finished run, then removes it', async () => {
    let deleted = false;
    const done = createSurface({ status: 'cancelled', progress: 0.2 });
    server.use(
      http.get(base, () => HttpResponse.json({ surfaces: deleted ? [] : [done] })),
      http.get(`${base}/srf_1`, () => HttpResponse.json({ surface: done })),
      http.post(`${base}/estimate`, () => HttpResponse.json({ error: { code: 'X', message: 'not needed' } }, { status: 400 })),
      http.delete(`${base}/srf_1`, () => {
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderWithProviders(
      <SurfacesStep orgId="org_1" workspaceId="wsp_1" sources={[createSurfaceSource()]} canWrite selectedId={null} onSelect={() => {}} />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Delete' }));
    expect(deleted).toBe(false);
    await userEvent.click(await screen.findByRole('button', { name: 'Delete surface' }));
    expect(await screen.findByText(/No demand surfaces yet/)).toBeInTheDocument();
    expect(deleted).toBe(true);
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createScoringSettings } from '../../testing/scoring-factories';
import { ScoringSettingsForm } from '../scoring-settings-form';

const url = '*/api/organizations/org_1/workspaces/wsp_1/scoring-settings';

describe('ScoringSettingsForm', () => {
  it('shows the defaults with a reason for α and β, and saves the typed values as numbers', async () => {
    let body: unknown = null;
    server.use(
      http.get(url, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.put(url, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ settings: createScoringSettings({ ...(body as object), isDefault: false, updatedAt: '2026-12-02T09:00:00.000Z' }) });
      }),
    );
    renderWithProviders(<ScoringSettingsForm orgId="org_1" workspaceId="wsp_1" canWrite />);

    const alpha = await screen.findByLabelText('Attractiveness exponent α');
    expect(alpha).toHaveValue('1');
    expect(screen.getByLabelText('Distance decay β')).toHaveValue('2');
    expect(screen.getByText(/Huff’s 1963 model/)).toBeInTheDocument();
    expect(screen.getByText(/less willing to travel, typical for everyday goods/)).toBeInTheDocument();

    await userEvent.clear(screen.getByLabelText('Distance decay β'));
    await userEvent.type(screen.getByLabelText('Distance decay β'), '2.5');
    await userEvent.click(screen.getByRole('button', { name: 'Add a ring' }));
    await userEvent.type(screen.getByLabelText('Ring 4 radius (km)'), '8');
    await userEvent.selectOptions(screen.getByLabelText('Rank candidates by'), 'Demand within 8 km');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText(/Saved; the next scoring run uses them/)).toBeInTheDocument();
    expect(body).toEqual({ alpha: 1, beta: 2.5, radii: [1, 3, 5, 8], radiusUnit: 'km', measure: 'ring:3', minDistanceM: null });
  });

  it('shows each bad value beside its field and sends nothing', async () => {
    let puts = 0;
    server.use(
      http.get(url, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.put(url, () => {
        puts += 1;
        return HttpResponse.json({ settings: createScoringSettings() });
      }),
    );
    renderWithProviders(<ScoringSettingsForm orgId="org_1" workspaceId="wsp_1" canWrite />);
    const beta = await screen.findByLabelText('Distance decay β');
    await userEvent.clear(beta);
    await userEvent.type(beta, '9');
    await userEvent.clear(screen.getByLabelText('Ring 2 radius (km)'));
    await userEvent.type(screen.getByLabelText('Ring 2 radius (km)'), '0.5');
    await userEvent.type(screen.getByLabelText('Minimum distance (m)'), '-3');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('Enter β between 0.5 and 5 (the usual value is 2).')).toBeInTheDocument();
    expect(beta).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Each ring must be larger than the one before it.')).toBeInTheDocument();
    expect(screen.getByText(/Enter metres above 0 and at most 50,000/)).toBeInTheDocument();
    expect(puts).toBe(0);
  });

  it('converts the rings when switching to miles and puts a server field error on its field', async () => {
    let body: { radii?: number[]; radiusUnit?: string } = {};
    server.use(
      http.get(url, () => HttpResponse.json({ settings: createScoringSettings() })),
      http.put(url, async ({ request }) => {
        body = (await request.json()) as typeof body;
        return apiErrorResponse(400, 'VALIDATION_FAILED', 'minDistanceM: The minimum distance must be below the smallest ring (1,609 m).', {
          field: 'minDistanceM',
          fields: { minDistanceM: 'The minimum distance must be below the smallest ring (1,609 m).', 'radii.2': 'ring radius 3.11 mi is taken' },
        });
      }),
    );
    renderWithProviders(<ScoringSettingsForm orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'Miles' }));
    expect(screen.getByLabelText('Ring 1 radius (mi)')).toHaveValue('0.62');
    expect(screen.getByLabelText('Ring 3 radius (mi)')).toHaveValue('3.11');
    await userEvent.type(screen.getByLabelText('Minimum distance (m)'), '2000');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));

    const message = await screen.findByText('The minimum distance must be below the smallest ring (1,609 m).');
    await waitFor(() => expect(screen.getByLabelText('Minimum distance (m)')).toHaveAttribute('aria-invalid', 'true'));
    expect(message).toHaveAttribute('role', 'alert');
    expect(screen.getByText('ring radius 3.11 mi is taken')).toBeInTheDocument();
    expect(screen.getByLabelText('Ring 3 radius (mi)')).toHaveAttribute('aria-invalid', 'true');
    expect(body).toMatchObject({ radii: [0.62, 1.86, 3.11], radiusUnit: 'mi' });
  });

  it('shows analysts and executives the settings without a form', async () => {
    server.use(http.get(url, () => HttpResponse.json({ settings: createScoringSettings({ beta: 2.5, radiusUnit: 'mi', radii: [1, 2], measure: 'ring:1' }) })));
    renderWithProviders(<ScoringSettingsForm orgId="org_1" workspaceId="wsp_1" canWrite={false} />);
    expect(await screen.findByText('1 mi, 2 mi')).toBeInTheDocument();
    expect(screen.getByText('2.5')).toBeInTheDocument();
    expect(screen.getByText('Demand within 2 mi')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save settings' })).not.toBeInTheDocument();
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createCustomerFile, createCustomerFilePreview } from '../../testing/customer-file-factories';
import { ColumnMappingForm } from '../column-mapping-form';

const importUrl = '*/api/organizations/org_1/workspaces/wsp_1/customer-files/cf_1/import';

describe('ColumnMappingForm', () => {
  it('pre-fills the detected columns and shows the first rows with the privacy line', async () => {
    renderWithProviders(
      <ColumnMappingForm orgId="org_1" workspaceId="wsp_1" file={createCustomerFile()} preview={createCustomerFilePreview()} onImportStarted={() => {}} />,
    );
    expect(await screen.findByLabelText('Longitude column')).toHaveValue('y_coord');
    expect(screen.getByLabelText('Latitude column')).toHaveValue('x_coord');
    expect(screen.getByLabelText('Weight column (optional)')).toHaveValue('spend_eur');
    expect(screen.getByText('Ada Fernhollow')).toBeInTheDocument();
    expect(screen.getByText(/names, addresses and other columns are discarded at import/)).toBeInTheDocument();
  });

  it('sends the analyst’s corrected mapping, weight kind and label', async () => {
    const bodies: unknown[] = [];
    server.use(
      http.post(importUrl, async ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
        bodies.push(await request.json());
        return HttpResponse.json({ customerFile: createCustomerFile({ status: 'importing' }) }, { status: 202 });
      }),
    );
    const onImportStarted = vi.fn();
    renderWithProviders(
      <ColumnMappingForm orgId="org_1" workspaceId="wsp_1" file={createCustomerFile()} preview={createCustomerFilePreview()} onImportStarted={onImportStarted} />,
    );

    await userEvent.selectOptions(await screen.findByLabelText('Longitude column'), 'x_coord');
    await userEvent.selectOptions(screen.getByLabelText('Latitude column'), 'y_coord');
    await userEvent.selectOptions(screen.getByLabelText('The weight is'), 'spend');
    await userEvent.type(screen.getByLabelText('Weight label (optional)'), 'annual spend (€)');
    await userEvent.click(screen.getByLabelText(/Exclude flagged outliers/));
    await userEvent.click(screen.getByRole('button', { name: 'Import' }));

    await waitFor(() => expect(onImportStarted).toHaveBeenCalled());
    expect(bodies).toEqual([
      {
        mapping: { lon: 'x_coord', lat: 'y_coord', weight: 'spend_eur' },
        weightKind: 'spend',
        weightLabel: 'annual spend (€)',
        excludeFlagged: true,
      },
    ]);
  });

  it('refuses the same column for longitude and latitude without asking the server', async () => {
    const posted = vi.fn();
    server.use(http.post(importUrl, () => (posted(), HttpResponse.json({}))));
    renderWithProviders(
      <ColumnMappingForm orgId="org_1" workspaceId="wsp_1" file={createCustomerFile()} preview={createCustomerFilePreview()} onImportStarted={() => {}} />,
    );
    await userEvent.selectOptions(await screen.findByLabelText('Latitude column'), 'y_coord');
    await userEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(await screen.findByText('Longitude and latitude must come from two different columns.')).toBeInTheDocument();
    expect(posted).not.toHaveBeenCalled();
  });

  it('leaves a choice empty when the detected column is missing and asks for it', async () => {
    renderWithProviders(
      <ColumnMappingForm
        orgId="org_1"
        workspaceId="wsp_1"
        file={createCustomerFile()}
        preview={createCustomerFilePreview({ detected: { delimiter: ';', decimalComma: true, encoding: 'latin1' } })}
        onImportStarted={() => {}}
      />,
    );
    expect(await screen.findByLabelText('Longitude column')).toHaveValue('');
    expect(screen.getByText(/separator “;”, decimal comma, encoding latin1/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(await screen.findByText(/Choose the column that holds the longitude/)).toBeInTheDocument();
  });

  it('shows the server’s message on the field it names', async () => {
    server.use(
      http.post(importUrl, () =>
        apiErrorResponse(400, 'VALIDATION_FAILED', 'Column “spend_eur” holds text in 90 % of the first rows.', { field: 'weight' }),
      ),
    );
    renderWithProviders(
      <ColumnMappingForm orgId="org_1" workspaceId="wsp_1" file={createCustomerFile()} preview={createCustomerFilePreview()} onImportStarted={() => {}} />,
    );
    await userEvent.selectOptions(await screen.findByLabelText('Longitude column'), 'x_coord');
    await userEvent.selectOptions(screen.getByLabelText('Latitude column'), 'y_coord');
    await userEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(await screen.findByText('Column “spend_eur” holds text in 90 % of the first rows.')).toBeInTheDocument();
    expect(screen.getByLabelText('Weight column (optional)')).toHaveAttribute('aria-invalid', 'true');
  });
});

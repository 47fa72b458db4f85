import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import {
  createCustomerFile,
  createCustomerFilePreview,
  createImportedCustomerFile,
} from '../../testing/customer-file-factories';
import type { CustomerFile } from '../../types';
import { CustomerFilesStep } from '../customer-files-step';

const base = '*/api/organizations/org_1/workspaces/wsp_1/customer-files';

describe('CustomerFilesStep', () => {
  it('takes an analyst from upload through the mapping to the validation report', async () => {
    let stored: CustomerFile[] = [];
    let polls = 0;
    let uploadedName = '';
    server.use(
      http.get(base, () => HttpResponse.json({ customerFiles: stored })),
      http.post(base, async ({ request }) => {
        if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
        const form = await request.formData();
        uploadedName = (form.get('file') as File).name;
        stored = [createCustomerFile()];
        return HttpResponse.json({ customerFile: stored[0], preview: createCustomerFilePreview() }, { status: 201 });
      }),
      http.post(`${base}/cf_1/import`, () => {
        polls = 0;
        stored = [createCustomerFile({ status: 'importing' })];
        return HttpResponse.json({ customerFile: stored[0] }, { status: 202 });
      }),
      http.get(`${base}/cf_1`, () => {
        // After the import starts, the first poll still sees it running; the next one sees it done.
        if (stored[0]?.status === 'importing' && ++polls >= 2) stored = [createImportedCustomerFile()];
        return HttpResponse.json({ customerFile: stored[0] });
      }),
    );
    renderWithProviders(<CustomerFilesStep orgId="org_1" workspaceId="wsp_1" canWrite />);

    expect(await screen.findByText(/No customer files yet/)).toBeInTheDocument();
    expect(screen.getByText(/up to 200 MB/)).toBeInTheDocument();
    await userEvent.upload(screen.getByLabelText('Choose a CSV or XLSX file'), new File(['x_coord,y_coord\n'], 'loyalty.csv', { type: 'text/csv' }));

    const lon = await screen.findByLabelText('Longitude column');
    expect(uploadedName).toBe('loyalty.csv');
    await userEvent.selectOptions(lon, 'x_coord');
    await userEvent.selectOptions(screen.getByLabelText('Latitude column'), 'y_coord');
    await userEvent.click(screen.getByRole('button', { name: 'Import' }));

    expect(await screen.findByRole('progressbar', { name: 'Import progress' })).toBeInTheDocument();
    const report = await screen.findByRole('region', { name: 'Validation report' }, { timeout: 6000 });
    expect(within(report).getByText('Longitude and latitude look swapped')).toBeInTheDocument();
    expect(polls).toBeGreaterThanOrEqual(2);
  }, 20_000);

  it('refuses a file that is not CSV or XLSX before sending it', async () => {
    server.use(http.get(base, () => HttpResponse.json({ customerFiles: [] })));
    renderWithProviders(<CustomerFilesStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    // The picker's accept filter is a hint only; a dropped or forced file is checked again.
    await userEvent.upload(screen.getByLabelText('Choose a CSV or XLSX file'), new File(['%PDF'], 'brochure.pdf'), { applyAccept: false });
    expect(await screen.findByText(/“brochure.pdf” is not a customer file Demandscape can read/)).toBeInTheDocument();
  });

  it('shows the server’s size limit when the file is too large', async () => {
    server.use(
      http.get(base, () => HttpResponse.json({ customerFiles: [] })),
      http.post(base, () => apiErrorResponse(413, 'FILE_TOO_LARGE', 'The file is larger than the 200 MB limit (UPLOAD_MAX_BYTES).')),
    );
    renderWithProviders(<CustomerFilesStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.upload(screen.getByLabelText('Choose a CSV or XLSX file'), new File(['a'], 'huge.csv'));
    expect(await screen.findByText('The file is larger than the 200 MB limit (UPLOAD_MAX_BYTES).')).toBeInTheDocument();
  });

  it('gives executives the list and counts without upload or delete', async () => {
    server.use(
      http.get(base, () => HttpResponse.json({ customerFiles: [createImportedCustomerFile({ report: { rejected: { 'null-island': 12 }, flagged: {}, examples: {} } })] })),
      http.get(`${base}/cf_1`, () => HttpResponse.json({ customerFile: createImportedCustomerFile() })),
    );
    renderWithProviders(<CustomerFilesStep orgId="org_1" workspaceId="wsp_1" canWrite={false} />);
    expect(await screen.findByRole('region', { name: 'Validation report' })).toBeInTheDocument();
    expect(screen.queryByText('Choose a CSV or XLSX file')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Delete/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Download rejected rows (CSV)' })).not.toBeInTheDocument();
  });

  it('explains that a file used by a running surface cannot be deleted', async () => {
    server.use(
      http.get(base, () => HttpResponse.json({ customerFiles: [createImportedCustomerFile()] })),
      http.get(`${base}/cf_1`, () => HttpResponse.json({ customerFile: createImportedCustomerFile() })),
      http.delete(`${base}/cf_1`, () =>
        apiErrorResponse(409, 'IN_USE', 'A demand surface that is queued or running uses this customer file.'),
      ),
    );
    renderWithProviders(<CustomerFilesStep orgId="org_1" workspaceId="wsp_1" canWrite />);
    await userEvent.click(await screen.findByRole('button', { name: 'Delete larchloaf-loyalty.csv' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Delete file' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This file is in use');
    expect(alert).toHaveTextContent('A demand surface that is queued or running uses this customer file.');
    await waitFor(() => expect(screen.getByRole('button', { name: 'Delete file' })).toBeEnabled());
  });
});

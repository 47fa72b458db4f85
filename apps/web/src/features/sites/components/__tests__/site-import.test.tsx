import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse, hasCsrf } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createSiteImportPreview } from '../../testing/site-factories';
import { SiteImport } from '../site-import';

const url = '*/api/organizations/org_1/workspaces/wsp_1/sites';
const csv = 'Site,X,Y,Type,Remarks\nGullwing Arcade,-38.502,44.511,candidate,corner unit\nSaltmarsh Lane,-38.478,94.533,candidate,\nTidegate Plaza,-38.530,44.498,shop,near the ferry\n';

type Sent = { fields: Record<string, string>; fileName: string; fileText: string };

function importApi(answers: Array<'rows-invalid' | 'ok'>) {
  const sent: Sent[] = [];
  const previews: string[] = [];
  server.use(
    http.post(`${url}/import/preview`, async ({ request }) => {
      if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
      const form = await request.formData();
      previews.push((form.get('file') as File).name);
      return HttpResponse.json(createSiteImportPreview());
    }),
    http.post(`${url}/import`, async ({ request }) => {
      if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', 'Missing CSRF token.');
      const form = await request.formData();
      const file = form.get('file') as File;
      const fields = Object.fromEntries([...form.entries()].filter(([k]) => k !== 'file').map(([k, v]) => [k, String(v)]));
      sent.push({ fields, fileName: file.name, fileText: await file.text() });
      if (answers[sent.length - 1] === 'rows-invalid') {
        return HttpResponse.json(
          {
            error: {
              code: 'SITE_ROWS_INVALID',
              message: '2 rows of the file have errors; nothing was imported. Fix them and upload the file again.',
              rowErrors: [
                { row: 3, field: 'lat', message: 'must be between -90 and 90 degrees (latitude)' },
                { row: 4, field: 'kind', message: 'must be one of candidate, own, competitor (got "shop")' },
              ],
            },
          },
          { status: 400 },
        );
      }
      return HttpResponse.json({ imported: 3 }, { status: 201 });
    }),
  );
  return { sent, previews };
}

async function chooseFile() {
  const file = new File([csv], 'quillport-candidates.csv', { type: 'text/csv' });
  await userEvent.upload(screen.getByLabelText('Choose a CSV or XLSX file'), file);
}

describe('SiteImport', () => {
  it('previews the file, pre-fills the mapping, shows every bad row when refused, keeps the choices, then imports', async () => {
    const { sent, previews } = importApi(['rows-invalid', 'ok']);
    const onImported = vi.fn();
    renderWithProviders(<SiteImport orgId="org_1" workspaceId="wsp_1" onImported={onImported} onCancel={() => {}} />);
    await chooseFile();

    // The server's guess fills the selects; the preview rows show which columns are used.
    expect(await screen.findByLabelText('Name column')).toHaveValue('Site');
    expect(previews).toEqual(['quillport-candidates.csv']);
    expect(screen.getByLabelText('Longitude column')).toHaveValue('X');
    expect(screen.getByLabelText('Latitude column')).toHaveValue('Y');
    expect(screen.getByLabelText('Kind column (optional)')).toHaveValue('Type');
    expect(screen.getByLabelText('Attractiveness column (optional)')).toHaveValue('');
    expect(screen.getByText('Gullwing Arcade')).toBeInTheDocument();
    expect(screen.getByText(/3 rows\)/)).toBeInTheDocument();
    expect(screen.getByText(/No column was found for: attractiveness/)).toBeInTheDocument();
    // Every parameter explains itself.
    expect(screen.getByText(siteDefaultHint)).toBeInTheDocument();

    // No attractiveness column: a default is needed before anything is sent.
    await userEvent.click(screen.getByRole('button', { name: 'Import 3 sites' }));
    expect(await screen.findByText(/enter the value every site gets, greater than 0/)).toBeInTheDocument();
    expect(sent).toHaveLength(0);

    await userEvent.selectOptions(screen.getByLabelText('Notes column (optional)'), '');
    await userEvent.type(screen.getByLabelText('Default attractiveness'), '140');
    await userEvent.click(screen.getByRole('button', { name: 'Import 3 sites' }));

    const table = await screen.findByRole('region', { name: 'Rows with errors' });
    expect(within(table).getByText(/Nothing was imported: 2 rows have 2 problems/)).toBeInTheDocument();
    const rows = within(table).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent));
    expect(rows).toEqual([
      ['3', 'latitude', 'must be between -90 and 90 degrees (latitude)'],
      ['4', 'kind', 'must be one of candidate, own, competitor (got "shop")'],
    ]);
    expect(sent[0]).toEqual({
      fileName: 'quillport-candidates.csv',
      fileText: csv,
      fields: {
        mapping: JSON.stringify({ name: 'Site', lon: 'X', lat: 'Y', kind: 'Type', attractiveness: null, attractivenessLabel: null, notes: null }),
        defaultKind: 'candidate',
        defaultAttractiveness: '140',
      },
    });

    // Nothing lost: the choices are still there for the next try.
    expect(screen.getByLabelText('Default attractiveness')).toHaveValue('140');
    expect(screen.getByLabelText('Notes column (optional)')).toHaveValue('');
    await userEvent.selectOptions(screen.getByLabelText('Kind column (optional)'), '');
    await userEvent.click(screen.getByRole('button', { name: 'Import 3 sites' }));
    await waitFor(() => expect(onImported).toHaveBeenCalledWith(3));
    expect(JSON.parse(sent[1]!.fields.mapping!)).toMatchObject({ kind: null });
    expect(sent[1]!.fields.defaultKind).toBe('candidate');
  });

  it('refuses the same column for longitude and latitude without sending', async () => {
    const { sent } = importApi(['ok']);
    renderWithProviders(<SiteImport orgId="org_1" workspaceId="wsp_1" onImported={() => {}} onCancel={() => {}} />);
    await chooseFile();
    await userEvent.selectOptions(await screen.findByLabelText('Latitude column'), 'X');
    await userEvent.selectOptions(screen.getByLabelText('Attractiveness column (optional)'), 'Remarks');
    await userEvent.click(screen.getByRole('button', { name: 'Import 3 sites' }));
    expect(await screen.findByText('Longitude and latitude must come from two different columns.')).toBeInTheDocument();
    expect(sent).toHaveLength(0);
  });

  it('says why a file could not be read', async () => {
    server.use(
      http.post(`${url}/import/preview`, () =>
        apiErrorResponse(400, 'FILE_UNREADABLE', 'The file is neither CSV nor XLSX: save it as .csv or .xlsx and choose it again.', { field: 'file' }),
      ),
    );
    renderWithProviders(<SiteImport orgId="org_1" workspaceId="wsp_1" onImported={() => {}} onCancel={() => {}} />);
    await chooseFile();
    expect(await screen.findByText('“quillport-candidates.csv” could not be read')).toBeInTheDocument();
    expect(screen.getByText('The file is neither CSV nor XLSX: save it as .csv or .xlsx and choose it again.')).toBeInTheDocument();
  });
});

const siteDefaultHint = 'Used for every row when the file has no attractiveness column; use the study’s one measure.';

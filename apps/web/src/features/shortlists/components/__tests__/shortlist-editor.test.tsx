import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createRun, createRunSummary, createShortlist, createShortlistItem, createShortlistVersion } from '../../testing/shortlist-factories';
import { ShortlistEditor } from '../shortlist-editor';

const base = '*/api/organizations/org_1/workspaces/wsp_1';
const planner = { id: 'usr_planner', name: 'Orrin Castellow' };

const v1 = createShortlistVersion({ version: 1, versionNote: 'First cut for the board.', items: [createShortlistItem({ name: 'Quay Street corner' })] });
const v2 = createShortlistVersion({ version: 2, versionNote: 'Added Ropewalk Yard', createdAt: '2026-12-02T11:00:00.000Z' });
const versions = [
  { version: 1, createdAt: v1.createdAt, createdBy: planner, versionNote: v1.versionNote, itemCount: 1 },
  { version: 2, createdAt: v2.createdAt, createdBy: planner, versionNote: v2.versionNote, itemCount: 2 },
];

function mockShortlist(extra: { onVersion?: (body: unknown) => void } = {}) {
  let latest = 2;
  const requested: string[] = [];
  server.use(
    http.get(`${base}/shortlists/shl_1`, ({ request }) => {
      const asked = new URL(request.url).searchParams.get('version');
      requested.push(asked ?? 'latest');
      const n = asked ? Number(asked) : latest;
      const version = n === 1 ? v1 : n === 2 ? v2 : createShortlistVersion({ version: 3, versionNote: 'Swapped order' });
      const all = latest === 3 ? [...versions, { ...versions[1]!, version: 3, versionNote: 'Swapped order' }] : versions;
      return HttpResponse.json({ shortlist: createShortlist({ latestVersion: latest, version, versions: all }) });
    }),
    http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [createRunSummary()] })),
    http.get(`${base}/scoring-runs/run_1`, () => HttpResponse.json({ run: createRun() })),
    http.post(`${base}/shortlists/shl_1/versions`, async ({ request }) => {
      extra.onVersion?.(await request.json());
      latest = 3;
      return HttpResponse.json({ shortlist: createShortlist({ latestVersion: 3 }) }, { status: 201 });
    }),
  );
  return requested;
}

describe('ShortlistEditor', () => {
  it('shows the latest version and reads an older one from the version picker', async () => {
    const requested = mockShortlist();
    renderWithProviders(<ShortlistEditor orgId="org_1" workspaceId="wsp_1" shortlistId="shl_1" canWrite onClose={() => {}} />);
    expect(await screen.findByText('Version 2 of 2')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Shortlisted sites' });
    expect(within(table).getByRole('rowheader', { name: 'Ropewalk Yard' })).toBeInTheDocument();

    const picker = screen.getByRole('combobox', { name: 'Version' });
    expect(within(picker).getAllByRole('option').map((o) => o.textContent)).toEqual([
      expect.stringMatching(/^Version 2 \(latest\) · .* · Orrin Castellow · 2 sites · Added Ropewalk Yard$/),
      expect.stringMatching(/^Version 1 · .* · 1 site · First cut for the board\.$/),
    ]);
    await userEvent.selectOptions(picker, '1');
    expect(await screen.findByText('Version 1 of 2')).toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: 'Shortlisted sites' })).queryByRole('rowheader', { name: 'Ropewalk Yard' })).not.toBeInTheDocument();
    expect(requested).toEqual(['latest', '1']);
  });

  it('saves edited order and notes as a new version starting from the version shown', async () => {
    let body: unknown = null;
    mockShortlist({ onVersion: (b) => (body = b) });
    renderWithProviders(<ShortlistEditor orgId="org_1" workspaceId="wsp_1" shortlistId="shl_1" canWrite onClose={() => {}} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Edit sites, order and notes' }));
    expect(screen.getByText(/Saving adds version 3/)).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Note for Quay Street corner' })).toHaveValue('Corner unit with morning foot traffic from the ferry.');
    expect(await screen.findByRole('checkbox', { name: 'Choose Ropewalk Yard' })).toBeChecked();

    await userEvent.click(screen.getByRole('button', { name: 'Move Ropewalk Yard up' }));
    await userEvent.clear(screen.getByRole('textbox', { name: 'Note for Quay Street corner' }));
    await userEvent.type(screen.getByRole('textbox', { name: /Version note/ }), 'Swapped order');
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));

    expect(await screen.findByText('Version 3 of 3')).toBeInTheDocument();
    expect(body).toEqual({ scoringRunId: 'run_1', items: [{ siteId: 'site_ropewalk' }, { siteId: 'site_quay' }], versionNote: 'Swapped order' });
  }, 20_000);

  it('flags chosen sites that a newly chosen run does not score and leaves them out of the new version', async () => {
    let body: unknown = null;
    mockShortlist({ onVersion: (b) => (body = b) });
    const later = createRun({ id: 'run_2', name: 'Huff β 2.5', finishedAt: '2026-12-02T12:00:00.000Z' });
    later.results!.candidates = later.results!.candidates.filter((c) => c.siteId !== 'site_ropewalk');
    server.use(
      http.get(`${base}/scoring-runs`, () => HttpResponse.json({ runs: [createRunSummary({ id: 'run_2', name: 'Huff β 2.5' }), createRunSummary()] })),
      http.get(`${base}/scoring-runs/run_2`, () => HttpResponse.json({ run: later })),
    );
    renderWithProviders(<ShortlistEditor orgId="org_1" workspaceId="wsp_1" shortlistId="shl_1" canWrite onClose={() => {}} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Edit sites, order and notes' }));
    const runSelect = await screen.findByRole('combobox', { name: 'Scoring run' });
    expect(runSelect).toHaveValue('run_1');
    await userEvent.selectOptions(runSelect, 'run_2');
    expect(await screen.findByText('Not in this run: left out when saved')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));
    await expect.poll(() => body).toEqual({ scoringRunId: 'run_2', items: [{ siteId: 'site_quay', note: 'Corner unit with morning foot traffic from the ferry.' }] });
  }, 20_000);

  it('renames, and deletes only after confirming', async () => {
    mockShortlist();
    let renamed: unknown = null;
    let deleted = false;
    let closed = false;
    server.use(
      http.patch(`${base}/shortlists/shl_1`, async ({ request }) => {
        renamed = await request.json();
        return HttpResponse.json({ shortlist: createShortlist({ name: 'Board list, March' }) });
      }),
      http.delete(`${base}/shortlists/shl_1`, () => {
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderWithProviders(<ShortlistEditor orgId="org_1" workspaceId="wsp_1" shortlistId="shl_1" canWrite onClose={() => (closed = true)} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Rename' }));
    const dialog = await screen.findByRole('dialog', { name: 'Rename shortlist' });
    const name = within(dialog).getByRole('textbox', { name: 'Shortlist name' });
    await userEvent.clear(name);
    await userEvent.type(name, 'Board list, March');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Rename' }));
    await expect.poll(() => renamed).toEqual({ name: 'Board list, March' });

    await userEvent.click(screen.getByRole('button', { name: 'Delete' }));
    const confirm = await screen.findByRole('dialog', { name: 'Delete this shortlist?' });
    expect(within(confirm).getByText(/all 2 versions will be deleted/)).toBeInTheDocument();
    expect(deleted).toBe(false);
    await userEvent.click(within(confirm).getByRole('button', { name: 'Delete shortlist' }));
    await expect.poll(() => closed).toBe(true);
    expect(deleted).toBe(true);
  }, 20_000);

  it('gives analysts and executives the versions without edit controls', async () => {
    mockShortlist();
    renderWithProviders(<ShortlistEditor orgId="org_1" workspaceId="wsp_1" shortlistId="shl_1" canWrite={false} onClose={() => {}} />);
    expect(await screen.findByText('Version 2 of 2')).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Version' })).toBeInTheDocument();
    for (const name of ['Edit sites, order and notes', 'Share with executives', 'Rename', 'Delete']) {
      expect(screen.queryByRole('button', { name })).not.toBeInTheDocument();
    }
  });
});

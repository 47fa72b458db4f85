import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

// Quillport is placed in open sea (invented demo city), around 38.5° W, 44.5° N.
const HARBOUR_ROW = { kind: 'own', name: 'Larchloaf Harbour Row', lon: -38.512, lat: 44.503, attractiveness: 180, attractivenessLabel: 'sales floor m²', notes: 'Flagship café.' };

describe('sites', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let ownerId: string;
  let orgId: string;
  let wsId: string;
  let base: string;
  beforeAll(async () => {
    ds = await testAppCreate();
    ({ client: owner, userId: ownerId } = await testUserSignedIn(ds, 'owner@sites-test.example', 'Maren Larchwood'));
    orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport north' }).expect(201)).body.workspace.id;
    base = `/api/organizations/${orgId}/workspaces/${wsId}/sites`;
  });
  afterAll(() => ds.close());

  it('creates, lists, filters, edits, moves and deletes sites', async () => {
    const created = (await owner.post(base, HARBOUR_ROW).expect(201)).body.site;
    expect(created).toMatchObject({ ...HARBOUR_ROW, createdBy: { id: ownerId, name: 'Maren Larchwood' } });
    expect(Object.keys(created).sort()).toEqual(['attractiveness', 'attractivenessLabel', 'createdAt', 'createdBy', 'id', 'kind', 'lat', 'lon', 'name', 'notes', 'updatedAt', 'workspaceId']);
    expect(created.workspaceId).toBe(wsId);
    const cand = (await owner.post(base, { kind: 'candidate', name: 'Tram depot corner', lon: -38.49, lat: 44.52, attractiveness: 7 }).expect(201)).body.site;
    expect(cand).toMatchObject({ attractivenessLabel: '', notes: '' });
    await owner.post(base, { kind: 'competitor', name: 'Rival bakery', lon: -38.5, lat: 44.51, attractiveness: 95 }).expect(201);

    const all = (await owner.get(base).expect(200)).body.sites;
    expect(all.map((s: { kind: string }) => s.kind)).toEqual(['candidate', 'competitor', 'own']);
    const candidates = (await owner.get(`${base}?kind=candidate`).expect(200)).body.sites;
    expect(candidates).toEqual([cand]);

    const renamed = (await owner.patch(`${base}/${cand.id}`, { name: 'Tram depot NE corner', notes: 'Lease ends 2028.' }).expect(200)).body.site;
    expect(renamed).toMatchObject({ name: 'Tram depot NE corner', notes: 'Lease ends 2028.', lon: cand.lon, lat: cand.lat });
    const moved = (await owner.patch(`${base}/${cand.id}`, { lon: -38.487, lat: 44.523 }).expect(200)).body.site;
    expect(moved).toMatchObject({ lon: -38.487, lat: 44.523, name: 'Tram depot NE corner' });

    await owner.del(`${base}/${cand.id}`).expect(204);
    await owner.patch(`${base}/${cand.id}`, { name: 'gone' }).expect(404);
    await owner.del(`${base}/${cand.id}`).expect(404);
    expect((await owner.get(`${base}?kind=candidate`).expect(200)).body.sites).toEqual([]);
  });

  it('records site.create, site.update and site.delete audit events', async () => {
    const s = (await owner.post(base, { ...HARBOUR_ROW, name: 'Audit me' }).expect(201)).body.site;
    await owner.patch(`${base}/${s.id}`, { attractiveness: 200 }).expect(200);
    await owner.del(`${base}/${s.id}`).expect(204);
    const events = (await owner.get(`/api/organizations/${orgId}/audit-events?limit=10`).expect(200)).body.events as { action: string; target: { id: string } | null; details: Record<string, unknown> }[];
    const mine = events.filter((e) => e.target?.id === s.id);
    expect(mine.map((e) => e.action)).toEqual(['site.delete', 'site.update', 'site.create']);
    expect(mine[1].details).toMatchObject({ fields: ['attractiveness'], workspaceId: wsId });
  });

  it('names the bad field with a clear message', async () => {
    const cases: [object, string, RegExp][] = [
      [{ ...HARBOUR_ROW, kind: 'warehouse' }, 'kind', /must be one of candidate, own, competitor/],
      [{ ...HARBOUR_ROW, name: '   ' }, 'name', /must not be empty/],
      [{ ...HARBOUR_ROW, name: 'n'.repeat(121) }, 'name', /at most 120 characters/],
      [{ ...HARBOUR_ROW, lon: 181 }, 'lon', /between -180 and 180/],
      [{ ...HARBOUR_ROW, lat: -90.5 }, 'lat', /between -90 and 90/],
      [{ ...HARBOUR_ROW, lat: '44.5' }, 'lat', /must be a number/],
      [{ ...HARBOUR_ROW, attractiveness: 0 }, 'attractiveness', /greater than 0/],
      [{ ...HARBOUR_ROW, attractiveness: -3 }, 'attractiveness', /greater than 0/],
      [{ ...HARBOUR_ROW, notes: 'x'.repeat(2001) }, 'notes', /at most 2000 characters/],
    ];
    for (const [body, field, message] of cases) {
      const res = await owner.post(base, body).expect(400);
      expect(res.body.error, JSON.stringify(body).slice(0, 80)).toMatchObject({ code: 'VALIDATION_FAILED', field });
      expect(res.body.error.message).toMatch(message);
      expect(res.body.error.message.startsWith(`${field}: `)).toBe(true);
    }
    const missing = await owner.post(base, {}).expect(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['attractiveness', 'kind', 'lat', 'lon', 'name']);
    await owner.post(base, { ...HARBOUR_ROW, name: 'n'.repeat(120), lon: 180, lat: -90 }).expect(201);
  });

  it('rejects an empty update, a half move and a bad kind filter', async () => {
    const s = (await owner.post(base, { ...HARBOUR_ROW, name: 'Edit me' }).expect(201)).body.site;
    const empty = await owner.patch(`${base}/${s.id}`, {}).expect(400);
    expect(empty.body.error.message).toMatch(/send at least one of/);
    const half = await owner.patch(`${base}/${s.id}`, { lon: -38.4 }).expect(400);
    expect(half.body.error).toMatchObject({ field: 'lat', message: 'lat: a move needs both lon and lat' });
    const badLat = await owner.patch(`${base}/${s.id}`, { lon: -38.4, lat: 95 }).expect(400);
    expect(badLat.body.error.field).toBe('lat');
    const filter = await owner.get(`${base}?kind=shop`).expect(400);
    expect(filter.body.error).toMatchObject({ field: 'kind' });
  });

  it("answers 404 for another organization's workspace or site, even through the caller's own organization", async () => {
    const s = (await owner.post(base, { ...HARBOUR_ROW, name: 'Private' }).expect(201)).body.site;
    const { client: other } = await testUserSignedIn(ds, 'owner-b@sites-test.example', 'Other Owner');
    const orgB = (await other.post('/api/organizations', { name: 'Org B' }).expect(201)).body.organization.id;
    const wsB = (await other.post(`/api/organizations/${orgB}/workspaces`, { name: 'B study' }).expect(201)).body.workspace.id;
    await other.get(base).expect(404);
    await other.patch(`${base}/${s.id}`, { name: 'stolen' }).expect(404);
    await other.del(`${base}/${s.id}`).expect(404);
    // Org B's path with org A's workspace, and org B's workspace with org A's site id.
    await other.get(`/api/organizations/${orgB}/workspaces/${wsId}/sites`).expect(404);
    await other.post(`/api/organizations/${orgB}/workspaces/${wsId}/sites`, HARBOUR_ROW).expect(404);
    await other.patch(`/api/organizations/${orgB}/workspaces/${wsB}/sites/${s.id}`, { name: 'stolen' }).expect(404);
    await other.del(`/api/organizations/${orgB}/workspaces/${wsB}/sites/${s.id}`).expect(404);
    // A site id used under a different workspace of the same organization is not found either.
    const ws2 = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Second' }).expect(201)).body.workspace.id;
    await owner.patch(`/api/organizations/${orgId}/workspaces/${ws2}/sites/${s.id}`, { name: 'x' }).expect(404);
    expect((await owner.get(`${base}`).expect(200)).body.sites.find((x: { id: string }) => x.id === s.id).name).toBe('Private');
  });

  it('removes sites with their workspace', async () => {
    const ws = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Temporary' }).expect(201)).body.workspace.id;
    await owner.post(`/api/organizations/${orgId}/workspaces/${ws}/sites`, HARBOUR_ROW).expect(201);
    await owner.del(`/api/organizations/${orgId}/workspaces/${ws}`).expect(204);
    const rows: { n: number }[] = await ds.orm.em.getConnection().execute('select count(*) as n from sites where workspace_id = ?', [ws]);
    expect(rows[0].n).toBe(0);
  });
});

describe('sites import (CSV and XLSX, with column mapping)', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let orgId: string;
  let base: string;
  beforeAll(async () => {
    ds = await testAppCreate();
    ({ client: owner } = await testUserSignedIn(ds, 'owner@sites-import.example', 'Maren Larchwood'));
    orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport north' }).expect(201)).body.workspace.id;
    base = `/api/organizations/${orgId}/workspaces/${wsId}/sites`;
  });
  afterAll(() => ds.close());

  const send = (path: string, file: string | Buffer, name: string, fields: Record<string, string> = {}) => {
    let req = owner.agent.post(`${base}${path}`).set('x-csrf-token', owner.token);
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return req.attach('file', Buffer.isBuffer(file) ? file : Buffer.from(file), name);
  };
  const upload = (csv: string, fields: Record<string, string> = {}) => send('/import', csv, 'sites.csv', fields);
  const names = async (kind: string) => ((await owner.get(`${base}?kind=${kind}`).expect(200)).body.sites as { name: string }[]).map((s) => s.name);

  async function workbook(rows: unknown[][]): Promise<Buffer> {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Sites');
    for (const r of rows) ws.addRow(r);
    return Buffer.from(await wb.xlsx.writeBuffer());
  }

  it('imports every row of a good CSV', async () => {
    const res = await upload('name,kind,lon,lat,attractiveness,notes\nQuay corner,candidate,-38.51,44.52,120,corner plot\nHarbour Row,own,-38.5,44.5,180,\n').expect(201);
    expect(res.body).toEqual({ imported: 2, emptyRows: 0 });
    expect(await names('candidate')).toEqual(['Quay corner']);
    expect(await names('own')).toEqual(['Harbour Row']);
    const events = (await owner.get(`/api/organizations/${orgId}/audit-events?action=site.import`).expect(200)).body.events;
    expect(events[0].details).toEqual({ count: 2, format: 'csv', emptyRows: 0 });
  });

  it('previews a CSV whose headers need the guessed mapping, then imports it with a default kind', async () => {
    const csv = 'Site name,Longitude,Latitude,Floor area (m²),Comment\nMill Lane,-38.47,44.53,140,near the tram stop\n,,,,\nSalt Street,-38.52,44.49,95,\n';
    const preview = (await send('/import/preview', csv, 'candidates.csv').expect(200)).body;
    expect(preview).toEqual({
      format: 'csv',
      columns: ['Site name', 'Longitude', 'Latitude', 'Floor area (m²)', 'Comment'],
      sampleRows: [
        ['Mill Lane', '-38.47', '44.53', '140', 'near the tram stop'],
        ['Salt Street', '-38.52', '44.49', '95', ''],
      ],
      rowCount: 2,
      mapping: { name: 'Site name', lon: 'Longitude', lat: 'Latitude', kind: null, attractiveness: 'Floor area (m²)', attractivenessLabel: null, notes: 'Comment' },
      missing: ['kind'],
      hasHeader: true,
    });
    const noKind = await upload(csv).expect(400);
    expect(noKind.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'mapping.kind', message: expect.stringMatching(/or send defaultKind/) });
    expect((await upload(csv, { defaultKind: 'candidate' }).expect(201)).body).toEqual({ imported: 2, emptyRows: 0 });
    const mill = (await owner.get(`${base}?kind=candidate`).expect(200)).body.sites.find((s: { name: string }) => s.name === 'Mill Lane');
    expect(mill).toMatchObject({ lon: -38.47, lat: 44.53, attractiveness: 140, attractivenessLabel: 'Floor area (m²)', notes: 'near the tram stop', createdBy: { name: 'Maren Larchwood' } });
    expect(Date.parse(mill.createdAt)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('imports an XLSX workbook (formula cells by their saved values) and counts rows left empty', async () => {
    const file = await workbook([
      ['Store', 'Type', 'Lng', 'Lat', 'Score', 'Other'],
      ['Brindlecrust Pier', 'rival', -38.495, 44.512, { formula: '3+4', result: 7 }, 'x'],
      ['', '', null, null, null, 'stray note'],
      ['Brindlecrust Market', 'comp', -38.521, 44.488, 6, ''],
    ]);
    const preview = (await send('/import/preview', file, 'rivals.xlsx').expect(200)).body;
    expect(preview).toMatchObject({ format: 'xlsx', rowCount: 3, missing: [], mapping: { name: 'Store', kind: 'Type', lon: 'Lng', lat: 'Lat', attractiveness: 'Score' } });
    expect((await send('/import', file, 'rivals.xlsx').expect(201)).body).toEqual({ imported: 2, emptyRows: 1 });
    const pier = (await owner.get(`${base}?kind=competitor`).expect(200)).body.sites.find((s: { name: string }) => s.name === 'Brindlecrust Pier');
    expect(pier).toMatchObject({ kind: 'competitor', attractiveness: 7, attractivenessLabel: 'Score' });
  });

  it('follows a mapping sent with the file (fields left out keep the guess) and a default attractiveness', async () => {
    const csv = 'Title,Where E,Where N,Status,Area\nKiln Yard,-38.46,44.54,prospect,not surveyed\n';
    const preview = (await send('/import/preview', csv, 'c.csv').expect(200)).body;
    expect(preview.missing).toEqual(['lon', 'lat']);
    const mapping = JSON.stringify({ lon: 'Where E', lat: 'Where N', attractiveness: null });
    const res = await upload(csv, { mapping, defaultAttractiveness: '4' }).expect(201);
    expect(res.body.imported).toBe(1);
    expect((await owner.get(`${base}?kind=candidate`).expect(200)).body.sites.find((s: { name: string }) => s.name === 'Kiln Yard')).toMatchObject({ lon: -38.46, lat: 44.54, attractiveness: 4, attractivenessLabel: '' });
  });

  it('refuses bad form fields with the field named', async () => {
    const csv = 'name,kind,lon,lat,attractiveness\nA,own,-38.5,44.5,1\n';
    const cases: [Record<string, string>, string, RegExp][] = [
      [{ mapping: '{not json' }, 'mapping', /must be JSON/],
      [{ mapping: '{"name":"Nope"}' }, 'mapping.name', /column "Nope" is not in the file/],
      [{ mapping: '{"place":"name"}' }, 'mapping', /./],
      [{ defaultKind: 'warehouse' }, 'defaultKind', /must be one of candidate, own, competitor/],
      [{ defaultAttractiveness: '-2' }, 'defaultAttractiveness', /greater than 0/],
    ];
    for (const [fields, field, message] of cases) {
      const res = await upload(csv, fields).expect(400);
      expect(res.body.error, JSON.stringify(fields)).toMatchObject({ code: 'VALIDATION_FAILED', field });
      expect(res.body.error.message).toMatch(message);
    }
  });

  it('imports nothing when any row is bad and lists each row error', async () => {
    const before = (await owner.get(base).expect(200)).body.sites.length;
    const res = await upload('name,kind,lon,lat,attractiveness\nFine,own,-38.5,44.5,10\nBad,shop,-38.5,144.5,10\n').expect(400);
    expect(res.body.error).toMatchObject({
      code: 'SITE_ROWS_INVALID',
      rowErrors: [
        { row: 3, field: 'kind', message: expect.stringMatching(/^"shop" is not a site kind; write one of: candidate \(or cand, prospect/) },
        { row: 3, field: 'lat', message: expect.stringMatching(/between -90 and 90/) },
      ],
    });
    expect(res.body.error.message).toMatch(/^1 row of the file has errors; nothing was imported/);
    const xlsx = await workbook([['Site', 'Lon', 'Lat', 'Kind', 'Size'], ['No size', -38.5, 44.5, 'own', 'large']]);
    const bad = await send('/import', xlsx, 'bad.xlsx').expect(400);
    expect(bad.body.error.rowErrors).toEqual([{ row: 2, field: 'attractiveness', message: expect.stringMatching(/must be a number .* got "large"/) }]);
    expect((await owner.get(base).expect(200)).body.sites.length).toBe(before);
  });

  it('asks for the file when none is sent and refuses files over 2 MB or of another type', async () => {
    for (const path of ['/import', '/import/preview']) {
      const res = await owner.post(`${base}${path}`, {}).expect(400);
      expect(res.body.error).toMatchObject({ field: 'file', message: expect.stringMatching(/multipart\/form-data in the field "file"/) });
    }
    const big = await upload('name,kind,lon,lat,attractiveness\n' + 'x'.repeat(2 * 1024 * 1024)).expect(413);
    expect(big.body.error.code).toBe('FILE_TOO_LARGE');
    const pdf = await send('/import/preview', Buffer.from('%PDF-1.4 sites'), 'sites.pdf').expect(415);
    expect(pdf.body.error.message).toMatch(/PDF document, not a sites table/);
  });
});

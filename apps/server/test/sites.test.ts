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
    expect(Object.keys(created).sort()).toEqual(['attractiveness', 'attractivenessLabel', 'createdAt', 'createdBy', 'id', 'kind', 'lat', 'lon', 'name', 'notes', 'updatedAt']);
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

describe('sites CSV import', () => {
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

  const upload = (csv: string) => owner.agent.post(`${base}/import`).set('x-csrf-token', owner.token).attach('file', Buffer.from(csv), 'sites.csv');

  it('imports every row of a good file', async () => {
    const res = await upload('name,kind,lon,lat,attractiveness,notes\nQuay corner,candidate,-38.51,44.52,120,corner plot\nHarbour Row,own,-38.5,44.5,180,\n').expect(201);
    expect(res.body).toEqual({ imported: 2 });
    const sites = (await owner.get(base).expect(200)).body.sites;
    expect(sites.map((s: { name: string; kind: string }) => `${s.kind}:${s.name}`)).toEqual(['candidate:Quay corner', 'own:Harbour Row']);
    const events = (await owner.get(`/api/organizations/${orgId}/audit-events?action=site.import`).expect(200)).body.events;
    expect(events[0].details).toEqual({ count: 2 });
  });

  it('imports nothing when any row is bad and lists each row error', async () => {
    const before = (await owner.get(base).expect(200)).body.sites.length;
    const res = await upload('name,kind,lon,lat,attractiveness\nFine,own,-38.5,44.5,10\nBad,own,-38.5,144.5,10\n').expect(400);
    expect(res.body.error).toMatchObject({ code: 'SITE_ROWS_INVALID', rowErrors: [{ row: 3, field: 'lat', message: expect.stringMatching(/between -90 and 90/) }] });
    expect(res.body.error.message).toMatch(/^1 row of the file has errors; nothing was imported/);
    expect((await owner.get(base).expect(200)).body.sites.length).toBe(before);
  });

  it('asks for the file when none is sent', async () => {
    const res = await owner.post(`${base}/import`, {}).expect(400);
    expect(res.body.error).toMatchObject({ field: 'file', message: expect.stringMatching(/multipart\/form-data in the field "file"/) });
  });
});

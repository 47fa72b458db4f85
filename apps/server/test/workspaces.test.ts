import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

describe('workspaces', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let base: string;
  let ownerId: string;
  beforeAll(async () => {
    ds = await testAppCreate();
    ({ client: owner, userId: ownerId } = await testUserSignedIn(ds, 'owner@ws-test.example', 'Maren Larchwood'));
    const org = await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201);
    base = `/api/organizations/${org.body.organization.id}/workspaces`;
  });
  afterAll(() => ds.close());

  it('creates, lists, reads, updates and deletes a workspace', async () => {
    const created = await owner.post(base, { name: 'Quillport north corridor 2027', description: 'Eight candidate sites along the tram line.' }).expect(201);
    const w = created.body.workspace;
    expect(w).toMatchObject({ name: 'Quillport north corridor 2027', description: 'Eight candidate sites along the tram line.', createdBy: { id: ownerId, name: 'Maren Larchwood' } });
    expect(Object.keys(w).sort()).toEqual(['createdAt', 'createdBy', 'description', 'id', 'name', 'updatedAt']);

    const list = await owner.get(base).expect(200);
    expect(list.body.workspaces).toEqual([w]);
    await owner.get(`${base}/${w.id}`).expect(200, { workspace: w });

    const updated = await owner.patch(`${base}/${w.id}`, { description: 'Six sites after the first review.' }).expect(200);
    expect(updated.body.workspace).toMatchObject({ name: w.name, description: 'Six sites after the first review.' });

    await owner.del(`${base}/${w.id}`).expect(204);
    await owner.get(`${base}/${w.id}`).expect(404);
    expect((await owner.get(base).expect(200)).body.workspaces).toEqual([]);
  });

  it('defaults the description to empty text', async () => {
    const res = await owner.post(base, { name: 'Harbour east' }).expect(201);
    expect(res.body.workspace.description).toBe('');
  });

  it('validates name and description lengths and rejects an empty update', async () => {
    const noName = await owner.post(base, {}).expect(400);
    expect(noName.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'name', message: 'name: is required' });
    const longName = await owner.post(base, { name: 'n'.repeat(121) }).expect(400);
    expect(longName.body.error.field).toBe('name');
    await owner.post(base, { name: 'n'.repeat(120) }).expect(201);
    const longText = await owner.post(base, { name: 'ok', description: 'd'.repeat(2001) }).expect(400);
    expect(longText.body.error.field).toBe('description');
    const w = (await owner.post(base, { name: 'To edit' }).expect(201)).body.workspace;
    const empty = await owner.patch(`${base}/${w.id}`, {}).expect(400);
    expect(empty.body.error.message).toBe('send at least one of name or description');
  });

  it('answers 404 for an unknown workspace id', async () => {
    await owner.get(`${base}/not-a-real-id`).expect(404);
    await owner.patch(`${base}/00000000-0000-4000-8000-000000000000`, { name: 'x' }).expect(404);
  });

  it('rejects bodies over 1 MB', async () => {
    const res = await owner.post(base, { name: 'big', description: 'x'.repeat(1_100_000) }).expect(413);
    expect(res.body.error.code).toBe('PAYLOAD_TOO_LARGE');
  });
});

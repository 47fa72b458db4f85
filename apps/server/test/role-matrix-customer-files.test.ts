import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import {
  testAppCreate,
  testClient,
  testMembershipAdd,
  testUserSignedIn,
  type TestClient,
} from './utils.js';
import { customerFileImported, fixture } from './fixtures/customer-files/helpers.js';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// The customer-file rows of the role matrix (same rules as role-matrix.test.ts: anonymous 401,
// another organization's member 404, a member whose role may not 403). Mirrors PERMISSIONS
// customerFile.read / customerFile.write / customerPoints.read.
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
const ROLES_ALL = ['owner', 'analyst', 'planner', 'executive'] as const;
const WRITERS = ['owner', 'analyst'] as const;

interface RouteRow {
  method: 'GET' | 'POST' | 'DELETE' | 'UPLOAD';
  /** `:base` is org A's workspace customer-files URL; `:fileId` the file the row needs. */
  route: string;
  body?: object;
  allowed: readonly Caller[];
  ok: number;
  /** Which file `:fileId` is: an imported one, or a fresh upload per call (destructive routes). */
  file?: 'imported' | 'fresh';
}

const MATRIX: RouteRow[] = [
  { method: 'GET', route: ':base', allowed: ROLES_ALL, ok: 200 },
  { method: 'UPLOAD', route: ':base', allowed: WRITERS, ok: 201 },
  { method: 'GET', route: ':base/:fileId', allowed: ROLES_ALL, ok: 200, file: 'imported' },
  { method: 'GET', route: ':base/:fileId/preview', allowed: WRITERS, ok: 200, file: 'fresh' },
  {
    method: 'POST',
    route: ':base/:fileId/import',
    body: { mapping: { lon: 'lon', lat: 'lat' }, weightKind: 'count' },
    allowed: WRITERS,
    ok: 202,
    file: 'fresh',
  },
  {
    method: 'GET',
    route: ':base/:fileId/rejected.csv',
    allowed: WRITERS,
    ok: 200,
    file: 'imported',
  },
  {
    method: 'GET',
    route: ':base/:fileId/aggregate?zoom=12',
    allowed: WRITERS,
    ok: 200,
    file: 'imported',
  },
  { method: 'DELETE', route: ':base/:fileId', allowed: WRITERS, ok: 204, file: 'fresh' },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

describe('role matrix: customer files', () => {
  let ds: DemandscapeApp;
  let dataDir: string;
  const clients = {} as Record<Caller, TestClient>;
  let base: string;
  let importedId: string;

  const upload = (client: TestClient, url: string) =>
    client.agent
      .post(url)
      .set('x-csrf-token', client.token)
      .attach('file', fixture('utf8-bom.csv'), 'm.csv');
  async function freshFile(): Promise<string> {
    return (await upload(clients.owner, base).expect(201)).body.customerFile.id;
  }

  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'ds-cf-matrix-'));
    ds = await testAppCreate({ DATA_DIR: dataDir });
    const owner = await testUserSignedIn(ds, 'owner@cf-matrix.example', 'Owner A');
    clients.owner = owner.client;
    const orgA = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201)).body
      .organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@cf-matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgA, u.userId, role);
      clients[role] = u.client;
    }
    const outsider = await testUserSignedIn(ds, 'owner-b@cf-matrix.example', 'Owner B');
    clients.outsider = outsider.client;
    await outsider.client.post('/api/organizations', { name: 'Org B' }).expect(201);
    clients.anonymous = await testClient(ds);
    const ws = (
      await owner.client
        .post(`/api/organizations/${orgA}/workspaces`, { name: 'A study' })
        .expect(201)
    ).body.workspace.id;
    base = `/api/organizations/${orgA}/workspaces/${ws}/customer-files`;
    importedId = await freshFile();
    await customerFileImported(clients.owner, base, importedId, {
      mapping: { lon: 'lon', lat: 'lat', weight: 'visits' },
      weightKind: 'visits',
    });
  });
  afterAll(async () => {
    await ds.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      for (const caller of CALLERS) {
        const fileId = row.file === 'fresh' ? await freshFile() : importedId;
        const path = row.route.replace(':base', base).replace(':fileId', fileId);
        const c = clients[caller];
        const res =
          row.method === 'UPLOAD'
            ? await upload(c, path)
            : row.method === 'GET'
              ? await c.get(path)
              : row.method === 'POST'
                ? await c.post(path, row.body)
                : await c.del(path);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400)
          expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }
});

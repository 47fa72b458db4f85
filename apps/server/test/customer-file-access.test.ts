import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConfigError, configFromEnv } from '../src/config.js';
import { CustomerFileSchema } from '../src/modules/customer-file/customer-file.entity.js';
import { customerFilesInterrupted } from '../src/modules/customer-file/customer-file-import.js';
import { testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';
import {
  customerFileImported,
  customerFileSetup,
  customerFileUpload,
  fixture,
  type CustomerFileSetup,
} from './fixtures/customer-files/helpers.js';

describe('customer files: limits, refused types, roles, aggregate', () => {
  let s: CustomerFileSetup;
  let executive: TestClient;
  let planner: TestClient;
  let outsider: TestClient;
  let importedId: string;
  beforeAll(async () => {
    s = await customerFileSetup({ UPLOAD_MAX_BYTES: '4096' });
    for (const role of ['executive', 'planner'] as const) {
      const u = await testUserSignedIn(s.ds, `${role}@cf-access.example`, role);
      await testMembershipAdd(s.ds, s.orgId, u.userId, role);
      if (role === 'executive') executive = u.client;
      else planner = u.client;
    }
    outsider = (await testUserSignedIn(s.ds, 'other@cf-access.example', 'Other')).client;
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'reasons.csv',
      fixture('validation-reasons.csv'),
    ).expect(201);
    importedId = up.body.customerFile.id;
    await customerFileImported(s.owner, s.base, importedId, {
      mapping: { lon: 'lon', lat: 'lat', weight: 'spend' },
      weightKind: 'spend',
    });
  });
  afterAll(() => s.close());

  it('refuses a file over UPLOAD_MAX_BYTES with 413, saying the size and the limit, and keeps nothing on disk', async () => {
    const big = 'lat,lon\n' + '44.5,-38.5\n'.repeat(1000);
    const res = await customerFileUpload(s.owner, s.base, 'big.csv', big).expect(413);
    expect(res.body.error.code).toBe('FILE_TOO_LARGE');
    expect(res.body.error.message).toMatch(
      /^The file is about 10\.\d KB; the limit is 4 KB\. Split the file or raise UPLOAD_MAX_BYTES\.$/,
    );
    expect(readdirSync(join(s.dataDir, 'uploads'))).toEqual([]);
  });

  it.each([
    [
      'a PNG image',
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]),
      'map.png',
      'This is a PNG image',
    ],
    ['a PDF', Buffer.from('%PDF-1.7\nlat,lon\n'), 'customers.csv', 'This is a PDF document'],
    [
      'an old .xls',
      Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0]),
      'c.xls',
      'old Excel 97–2003',
    ],
    ['binary data', Buffer.from([0x01, 0x02, 0x00, 0x04, 0x05]), 'c.bin', 'contains binary data'],
    ['UTF-16 text', Buffer.from('\ufefflat,lon\n', 'utf16le'), 'c.csv', 'UTF-16'],
  ])(
    'refuses %s with 415 and a message saying what to upload',
    async (_what, bytes, name, text) => {
      const res = await customerFileUpload(s.owner, s.base, name, bytes).expect(415);
      expect(res.body.error.code).toBe('UNSUPPORTED_FILE_TYPE');
      expect(res.body.error.message).toContain(text);
      expect(readdirSync(join(s.dataDir, 'uploads')).length).toBe(0);
    },
  );

  it('refuses an empty file, a single-column file and a request without a file', async () => {
    expect(
      (await customerFileUpload(s.owner, s.base, 'e.csv', '  \n').expect(400)).body.error.code,
    ).toBe('EMPTY_FILE');
    expect(
      (await customerFileUpload(s.owner, s.base, 'one.csv', 'latlon\n1\n').expect(400)).body.error
        .code,
    ).toBe('NO_COLUMNS');
    const none = await s.owner.post(s.base, {}).expect(400);
    expect(none.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'file' });
  });

  it('shows executives and planners the metadata and report counts, never example rows', async () => {
    for (const client of [executive, planner]) {
      const one = await client.get(`${s.base}/${importedId}`).expect(200);
      expect(one.body.customerFile).toMatchObject({
        status: 'imported',
        rowCount: 34,
        acceptedCount: 24,
      });
      expect(one.body.customerFile.report.rejected['null-island']).toBe(1);
      expect(one.body.customerFile.report.examples).toEqual({});
      const list = await client.get(s.base).expect(200);
      expect(list.body.customerFiles[0].report.examples).toEqual({});
      await client.get(`${s.base}/${importedId}/rejected.csv`).expect(403);
      await client.get(`${s.base}/${importedId}/aggregate?zoom=10`).expect(403);
      await customerFileUpload(client, s.base, 'c.csv', fixture('utf8-bom.csv')).expect(403);
    }
    const own = await s.owner.get(`${s.base}/${importedId}`).expect(200);
    expect(own.body.customerFile.report.examples['null-island']).toEqual([
      { row: 7, lon: '0', lat: '0', weight: '10' },
    ]);
  });

  it("answers 404 for another organization's file, also through the other organization's own path", async () => {
    await outsider.get(`${s.base}/${importedId}`).expect(404);
    const orgB = (await outsider.post('/api/organizations', { name: 'Other chain' }).expect(201))
      .body.organization.id;
    const wsB = (
      await outsider.post(`/api/organizations/${orgB}/workspaces`, { name: 'B' }).expect(201)
    ).body.workspace.id;
    const baseB = `/api/organizations/${orgB}/workspaces/${wsB}/customer-files`;
    await outsider.get(`${baseB}/${importedId}`).expect(404);
    await outsider.get(`${baseB}/${importedId}/rejected.csv`).expect(404);
    await outsider.del(`${baseB}/${importedId}`).expect(404);
    // A workspace of org A under org B's path is not found either.
    await outsider
      .get(`/api/organizations/${orgB}/workspaces/${s.workspaceId}/customer-files`)
      .expect(404);
    await s.owner.get(`${s.base}/${importedId}`).expect(200);
  });

  it('aggregates into bins of at least 11 customers and reports what was suppressed', async () => {
    // 24 accepted points: a 0.02° ring (~2 km) of 20, two at the centre, one duplicate, one far away.
    const fine = await s.owner.get(`${s.base}/${importedId}/aggregate?zoom=16`).expect(200);
    expect(fine.body).toMatchObject({
      type: 'FeatureCollection',
      features: [],
      binSizeM: 250,
      minCount: 11,
      suppressed: { customers: 24 },
    });
    const coarse = await s.owner.get(`${s.base}/${importedId}/aggregate?zoom=6`).expect(200);
    const counts = coarse.body.features.map(
      (f: { properties: { count: number } }) => f.properties.count,
    );
    expect(counts.every((c: number) => c >= 11)).toBe(true);
    expect(
      counts.reduce((a: number, b: number) => a + b, 0) + coarse.body.suppressed.customers,
    ).toBe(24);
    expect(coarse.body.suppressed.customers).toBeGreaterThanOrEqual(1);
    const bad = await s.owner.get(`${s.base}/${importedId}/aggregate?zoom=30`).expect(400);
    expect(bad.body.error.field).toBe('zoom');
  });

  it('marks imports interrupted by a server stop as failed, keeping the raw upload', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'c.csv', fixture('utf8-bom.csv')).expect(
      201,
    );
    const em = s.ds.orm.em.fork();
    await em.nativeUpdate(
      CustomerFileSchema,
      { id: up.body.customerFile.id },
      { status: 'importing' },
    );
    expect(await customerFilesInterrupted(s.ds.orm)).toBe(1);
    const f = (await s.owner.get(`${s.base}/${up.body.customerFile.id}`).expect(200)).body
      .customerFile;
    expect(f).toMatchObject({
      status: 'failed',
      rawFileKept: true,
      error: {
        code: 'IMPORT_INTERRUPTED',
        message: 'Import interrupted (the server stopped) — run the import again.',
      },
    });
    await s.owner.get(`${s.base}/${f.id}/preview`).expect(200);
  });
});

describe('UPLOAD_MAX_BYTES and the uploads folder', () => {
  it('defaults to 200 MB under DATA_DIR/uploads and refuses a bad value by name', () => {
    const config = configFromEnv({ NODE_ENV: 'test', DATA_DIR: '/srv/ds-data' });
    expect(config.uploadMaxBytes).toBe(200 * 1024 * 1024);
    expect(config.uploadsDir).toBe(join('/srv/ds-data', 'uploads'));
    expect(configFromEnv({ NODE_ENV: 'test', UPLOAD_MAX_BYTES: '1048576' }).uploadMaxBytes).toBe(
      1048576,
    );
    expect(() => configFromEnv({ NODE_ENV: 'test', UPLOAD_MAX_BYTES: '200MB' })).toThrow(
      ConfigError,
    );
    expect(() => configFromEnv({ NODE_ENV: 'test', UPLOAD_MAX_BYTES: '0' })).toThrow(
      'UPLOAD_MAX_BYTES: must be at least 1 byte',
    );
  });
});

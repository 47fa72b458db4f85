import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate } from './utils.js';
import { migrationsList } from '../src/migrations/index.js';

describe('GET /api/health', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    ds = await testAppCreate();
  });
  afterAll(() => ds.close());

  it('reports ok with the database reachable', async () => {
    const res = await request(ds.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', version: '0.1.0', database: 'ok' });
  });

  it('sets security headers including a CSP that allows blob workers and data images', async () => {
    const res = await request(ds.app).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("worker-src 'self' blob:");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('answers unknown API paths with a JSON 404', async () => {
    const res = await request(ds.app).get('/api/nothing-here').expect(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
  });

  it('has applied the checked-in migrations (no schema sync)', async () => {
    const rows: { name: string }[] = await ds.orm.em.getConnection().execute('select name from mikro_orm_migrations');
    expect(rows.map((r) => r.name)).toEqual(migrationsList.map((m) => m.name));
  });

  it('reports 503 when the database does not answer', async () => {
    const other = await testAppCreate();
    await other.orm.close(true);
    const res = await request(other.app).get('/api/health').expect(503);
    expect(res.body.database).toBe('error');
  });
});

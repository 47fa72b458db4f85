import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate } from './utils.js';
import { migrationsList } from '../src/migrations/index.js';

describe('serving the built web app', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    const dist = mkdtempSync(join(tmpdir(), 'ds-web-dist-'));
    mkdirSync(join(dist, 'assets'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Demandscape</title><div id="root"></div>');
    writeFileSync(join(dist, 'assets', 'app.js'), 'console.log("demandscape");');
    ds = await testAppCreate({ WEB_DIST: dist });
  });
  afterAll(() => ds.close());

  it('serves files and falls back to index.html for app routes', async () => {
    expect(ds.servesWeb).toBe(true);
    const asset = await request(ds.app).get('/assets/app.js').expect(200);
    expect(asset.headers['content-type']).toMatch(/javascript/);
    for (const path of ['/', '/sign-in', '/reset-password?token=abc', '/orgs/1/workspaces/2']) {
      const res = await request(ds.app).get(path).expect(200);
      expect(res.text).toContain('<title>Demandscape</title>');
    }
  });

  it('keeps unknown API paths as JSON 404s', async () => {
    const res = await request(ds.app).get('/api/not-a-route').expect(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
  });
});

describe('SQLite file database', () => {
  it('runs in WAL mode with foreign keys on', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ds-db-'));
    const ds = await testAppCreate({ DATABASE_FILE: join(dir, 'demandscape.sqlite') });
    try {
      const conn = ds.orm.em.getConnection();
      const [mode]: { journal_mode: string }[] = await conn.execute('pragma journal_mode');
      const [fk]: { foreign_keys: number }[] = await conn.execute('pragma foreign_keys');
      expect(mode.journal_mode).toBe('wal');
      expect(fk.foreign_keys).toBe(1);
    } finally {
      await ds.close();
    }
  });

  it('applies migrations once: a second start on the same file changes nothing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ds-db-'));
    const file = join(dir, 'demandscape.sqlite');
    await (await testAppCreate({ DATABASE_FILE: file })).close();
    const again = await testAppCreate({ DATABASE_FILE: file });
    try {
      const rows: { name: string }[] = await again.orm.em.getConnection().execute('select name from mikro_orm_migrations');
      expect(rows).toHaveLength(migrationsList.length);
    } finally {
      await again.close();
    }
  });
});

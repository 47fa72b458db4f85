import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { demoCustomers } from '@demandscape/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { DEMO_CUSTOMER_COUNT, DEMO_CUSTOMER_SEED } from '../src/seed/demo-customer-file.js';
import { DEMO_PASSWORD, demoSeed } from '../src/seed/demo-seed.js';
import { DEMO_SITE_LABEL, DEMO_SITES } from '../src/seed/demo-sites.js';
import { testAppCreate, testClient, type TestClient } from './utils.js';

type Position = [number, number];
interface Feature {
  properties: { layer: string; name?: string };
  geometry: { type: string; coordinates: unknown };
}
const basemap = JSON.parse(readFileSync(fileURLToPath(new URL('../../web/public/basemap/quillport.geojson', import.meta.url)), 'utf8')) as { features: Feature[] };
const land = (basemap.features.find((f) => f.properties.layer === 'land')!.geometry.coordinates as Position[][])[0];

/** Even–odd ray casting (point in polygon), in degrees: fine over a city-sized polygon [CP]. */
function inside([x, y]: Position, ring: Position[]): boolean {
  let c = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) c = !c;
  }
  return c;
}

/** Equirectangular distance in km at Quillport's latitude (errors ≪ 1 % over a few km) [D]. */
function km([x1, y1]: Position, [x2, y2]: Position): number {
  const r = 6371.0088;
  const rad = Math.PI / 180;
  return r * rad * Math.hypot((x2 - x1) * Math.cos(44.5 * rad), y2 - y1);
}

interface SiteJson {
  id: string;
  kind: string;
  name: string;
  lon: number;
  lat: number;
  attractiveness: number;
  attractivenessLabel: string;
  notes: string;
  createdBy: { name: string } | null;
}

describe('demo sites', () => {
  let ds: DemandscapeApp;
  let planner: TestClient;
  let base: string;
  let first: Awaited<ReturnType<typeof demoSeed>>;
  beforeAll(async () => {
    ds = await testAppCreate();
    first = await demoSeed(ds.orm.em.fork());
    planner = await testClient(ds);
    await planner.post('/api/auth/sign-in', { email: 'planner@larchloaf.example', password: DEMO_PASSWORD }).expect(200);
    await planner.refresh();
    base = `/api/organizations/${first.organizationId}/workspaces/${first.workspaceId}/sites`;
  });
  afterAll(() => ds.close());

  const sites = async (): Promise<SiteJson[]> => (await planner.get(base).expect(200)).body.sites;

  it('gives the demo workspace 6 own stores, 8 candidates and 9 stores of 3 competitor chains, once', async () => {
    expect(first.created).toContain(`${DEMO_SITES.length} demo sites`);
    const all = await sites();
    const count = (kind: string) => all.filter((s) => s.kind === kind).length;
    expect([count('own'), count('candidate'), count('competitor')]).toEqual([6, 8, 9]);
    expect(new Set(all.map((s) => s.name)).size).toBe(all.length);
    const chains = new Set(all.filter((s) => s.kind === 'competitor').map((s) => s.notes.split(':')[0]));
    expect([...chains].sort()).toEqual(['Brindlecrust', 'Kettlewhistle Coffee', 'Ovenwren Bakehouse']);
    for (const s of all) {
      expect(s.attractiveness, s.name).toBeGreaterThan(0);
      expect(s.attractivenessLabel).toBe(DEMO_SITE_LABEL);
      expect(s.notes.length, s.name).toBeGreaterThan(10);
      expect(s.notes.includes('\n')).toBe(false);
      expect(s.createdBy?.name).toBe('Ilse Dunmore');
    }
    expect(all.filter((s) => s.kind === 'own').every((s) => s.name.startsWith('Larchloaf '))).toBe(true);

    const second = await demoSeed(ds.orm.em.fork());
    expect(second.created).toEqual([]);
    expect(await sites()).toEqual(all);
    const events = (await (await signedIn('owner@larchloaf.example')).get(`/api/organizations/${first.organizationId}/audit-events?action=site.import`).expect(200)).body.events;
    expect(events).toHaveLength(1);
    expect(events[0].details).toEqual({ count: 23, format: 'demo' });
  });

  it('places every site on land on the demo basemap, with demo customers around it', async () => {
    const customers = demoCustomers(DEMO_CUSTOMER_COUNT, DEMO_CUSTOMER_SEED);
    for (const s of await sites()) {
      expect(inside([s.lon, s.lat], land), `${s.name} on land`).toBe(true);
      let near = 0;
      for (let k = 0; k < customers.lon.length; k++) if (km([s.lon, s.lat], [customers.lon[k], customers.lat[k]]) < 2) near++;
      // At least 1 % of the demo customers within 2 km: no site stands in empty country.
      expect(near, `${s.name}: demo customers within 2 km`).toBeGreaterThan(DEMO_CUSTOMER_COUNT / 100);
    }
  });

  it('imports the browser test’s candidates file by the guessed mapping with candidate as the default kind', async () => {
    const csv = readFileSync(fileURLToPath(new URL('../../../tests/e2e/fixtures/quillport-candidates.csv', import.meta.url)));
    const send = (path: string, fields: Record<string, string> = {}) => {
      let req = planner.agent.post(`${base}${path}`).set('x-csrf-token', planner.token);
      for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
      return req.attach('file', csv, 'quillport-candidates.csv');
    };
    const preview = (await send('/import/preview').expect(200)).body;
    expect(preview).toMatchObject({ rowCount: 3, missing: ['kind'], mapping: { name: 'Site name', lon: 'Longitude', lat: 'Latitude', kind: null, attractiveness: 'Floor area (m²)', notes: 'Comment' } });
    expect((await send('/import', { defaultKind: 'candidate' }).expect(201)).body).toEqual({ imported: 3, emptyRows: 0 });
    const added = (await sites()).filter((s) => preview.sampleRows.some((r: string[]) => r[0] === s.name));
    expect(added).toHaveLength(3);
    for (const s of added) {
      expect(s).toMatchObject({ kind: 'candidate', attractivenessLabel: 'Floor area (m²)' });
      expect(inside([s.lon, s.lat], land), `${s.name} on land`).toBe(true);
    }
  });

  async function signedIn(email: string): Promise<TestClient> {
    const c = await testClient(ds);
    await c.post('/api/auth/sign-in', { email, password: DEMO_PASSWORD }).expect(200);
    await c.refresh();
    return c;
  }
});

import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserLaunch } from './browser-launch.js';
import { pageOpen } from './page-setup.js';
import { pngPixels } from './png-pixels.js';
import { serverStart, type RunningServer } from './server-start.js';

// The seeded demo analyst of the invented Larchloaf chain (apps/server/src/seed/demo-seed.ts).
const ANALYST = { email: 'analyst@larchloaf.example', password: 'larchloaf-demo-2027' };
const artifacts = join(dirname(fileURLToPath(import.meta.url)), 'artifacts');

/** Invented customers around Quillport's districts (open sea, lon −38.5°, lat 44.5°), seeded. */
function quillportCsv(n: number): string {
  let seed = 7;
  const uniform = () => ((seed = (seed * 16807) % 2147483647) - 1) / 2147483646;
  const normal = () => Math.sqrt(-2 * Math.log(uniform() + 1e-12)) * Math.cos(2 * Math.PI * uniform());
  const districts = [
    [0.4, -1.2, 1.1],
    [-3.1, 0.8, 1.6],
    [4.2, 2.6, 2.2],
    [1.8, -4.3, 0.9],
  ];
  const lines = ['customer_lon,customer_lat,annual_spend'];
  for (let i = 0; i < n; i++) {
    const [east, north, sd] = districts[i % districts.length];
    const lon = -38.5 + ((east + sd * normal()) * 1000) / (111_195 * Math.cos((44.5 * Math.PI) / 180));
    const lat = 44.5 + ((north + sd * normal()) * 1000) / 111_195;
    lines.push(`${lon.toFixed(6)},${lat.toFixed(6)},${(120 + 100 * uniform()).toFixed(2)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** A tiny API client with a cookie jar and the CSRF header, to prepare data the way the web app would. */
function apiClient(baseUrl: string) {
  const cookies = new Map<string, string>();
  let csrf = '';
  const remember = (response: Response) => {
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const at = pair.indexOf('=');
      cookies.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookieHeader = () => [...cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  const call = async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    if (method !== 'GET' && !csrf) {
      const r = await fetch(`${baseUrl}/api/auth/csrf`, { headers: { cookie: cookieHeader() } });
      remember(r);
      csrf = ((await r.json()) as { csrfToken: string }).csrfToken;
    }
    const isForm = body instanceof FormData;
    const response = await fetch(`${baseUrl}/api${path}`, {
      method,
      headers: { cookie: cookieHeader(), ...(method !== 'GET' ? { 'x-csrf-token': csrf } : {}), ...(body && !isForm ? { 'content-type': 'application/json' } : {}) },
      body: isForm ? body : body === undefined ? undefined : JSON.stringify(body),
    });
    remember(response);
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text}`);
    return (text ? JSON.parse(text) : undefined) as T;
  };
  return { call, cookies, resetCsrf: () => (csrf = '') };
}

async function until<T>(what: string, read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 120_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not finish in ${timeoutMs / 1000} s; last: ${JSON.stringify(value).slice(0, 400)}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

describe('the demand surface map in a real browser', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let page: Page;
  let workspaceUrl = '';
  const pageErrors: string[] = [];
  const outside: string[] = [];
  const consoleErrors: string[] = [];

  beforeAll(async () => {
    mkdirSync(artifacts, { recursive: true });
    server = await serverStart({ googleEmail: 'nobody@larchloaf.test', googleName: 'Nobody', demoSeed: true });
    const api = apiClient(server.baseUrl);
    await api.call('POST', '/auth/sign-in', ANALYST);
    api.resetCsrf(); // the token is bound to the session, which sign-in renews
    const me = await api.call<{ memberships: { organization: { id: string } }[] }>('GET', '/me');
    const orgId = me.memberships[0].organization.id;
    const { workspaces } = await api.call<{ workspaces: { id: string }[] }>('GET', `/organizations/${orgId}/workspaces`);
    const ws = `/organizations/${orgId}/workspaces/${workspaces[0].id}`;
    const form = new FormData();
    form.set('file', new Blob([quillportCsv(4000)], { type: 'text/csv' }), 'quillport-loyalty.csv');
    const { customerFile } = await api.call<{ customerFile: { id: string } }>('POST', `${ws}/customer-files`, form);
    await api.call('POST', `${ws}/customer-files/${customerFile.id}/import`, {
      mapping: { lon: 'customer_lon', lat: 'customer_lat', weight: 'annual_spend' },
      weightKind: 'spend',
      weightLabel: 'annual spend',
    });
    await until(
      'The import',
      () => api.call<{ customerFile: { status: string } }>('GET', `${ws}/customer-files/${customerFile.id}`),
      (r) => r.customerFile.status !== 'importing',
    );
    const { surface } = await api.call<{ surface: { id: string } }>('POST', `${ws}/surfaces`, { customerFileId: customerFile.id, name: 'Quillport spend', unit: 'km2' });
    const done = await until(
      'The surface run',
      () => api.call<{ surface: { status: string } }>('GET', `${ws}/surfaces/${surface.id}`),
      (r) => ['succeeded', 'failed', 'cancelled'].includes(r.surface.status),
    );
    expect(done.surface.status).toBe('succeeded');
    const { surface: narrow } = await api.call<{ surface: { id: string } }>('POST', `${ws}/surfaces`, {
      customerFileId: customerFile.id,
      name: 'Quillport spend, 800 m',
      bandwidth: { mode: 'value', value: 800 },
      unit: 'km2',
    });
    const second = await until(
      'The second surface run',
      () => api.call<{ surface: { status: string } }>('GET', `${ws}/surfaces/${narrow.id}`),
      (r) => ['succeeded', 'failed', 'cancelled'].includes(r.surface.status),
    );
    expect(second.surface.status).toBe('succeeded');

    context = await browserLaunch();
    await context.addCookies([...api.cookies].map(([name, value]) => ({ name, value, url: server.baseUrl })));
    page = await pageOpen(context, pageErrors, { defaultTimeout: 60_000 });
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(message.text().slice(0, 300));
    });
    page.on('request', (request) => {
      const url = request.url();
      if (!url.startsWith(server.baseUrl) && !url.startsWith('data:') && !url.startsWith('blob:')) outside.push(url);
    });
    workspaceUrl = `${server.baseUrl}/orgs/${orgId}/workspaces/${workspaces[0].id}`;
  }, 240_000);

  afterAll(async () => {
    await context?.close();
    await server?.stop();
  });

  it('draws the demo basemap, the surface, its legend in real units and the value under the cursor, offline', async () => {
    await page.goto(workspaceUrl);
    const canvas = page.locator('canvas.maplibregl-canvas').first();
    await canvas.waitFor();
    await page.getByText('(annual spend per km²)').waitFor();
    await page.getByText('HARBOUR STEPS', { exact: false }).first().waitFor();
    await page.getByLabel(/50 % of demand within/).waitFor();
    await page.getByText(/not a forecast of sales/).waitFor();
    // Let MapLibre decode the surface image and draw a few frames.
    await page.waitForTimeout(3000);
    const box = (await canvas.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.getByText(/^[\d,.]+ annual spend per km²$/).waitFor();
    await page.screenshot({ path: join(artifacts, 'map-surface.png'), fullPage: true });

    // The map's pixels as shown: the basemap's sea colour and surface colours are really drawn.
    const { data } = pngPixels(await canvas.screenshot());
    const colours = { sea: 0, coloured: 0 };
    for (let i = 0; i < data.length; i += 4) {
      const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
      if (Math.abs(r - 0xdd) < 6 && Math.abs(g - 0xe7) < 6 && Math.abs(b - 0xec) < 6) colours.sea++;
      // Surface colours are far from the grey-beige basemap: clearly yellow or clearly blue.
      if (b + 60 < r || r + 60 < b) colours.coloured++;
    }
    expect(colours.sea).toBeGreaterThan(100);
    expect(colours.coloured).toBeGreaterThan(100);
    expect(outside).toEqual([]);
    expect(pageErrors).toEqual([]);
    expect(consoleErrors).toEqual([]);
    await expect(page.getByText('The map could not draw everything').count()).resolves.toBe(0);
  });

  it('shows aggregated customers in suppressed squares and the difference between two surfaces', async () => {
    await page.getByLabel(/Show customers/).check();
    await page.getByText(/customers per [\d.,]+ (m|km) square/).waitFor();
    await page.getByText(/fewer than 11 customers are hidden/).waitFor();
    const compare = page.getByLabel('Compare with');
    const options = await compare.locator('option').allTextContents();
    const other = options.find((o) => o !== 'No comparison')!;
    await compare.selectOption({ label: other });
    await page.getByText(`Difference: ${other} minus this one`).waitFor();
    await page.waitForTimeout(1500);
    await page.screenshot({ path: join(artifacts, 'map-difference.png'), fullPage: true });
    await page.getByRole('radio', { name: 'Side by side' }).click();
    await expect.poll(() => page.locator('canvas.maplibregl-canvas').count()).toBe(2);
    await page.waitForTimeout(1500);
    await page.screenshot({ path: join(artifacts, 'map-side-by-side.png'), fullPage: true });
    expect(pageErrors).toEqual([]);
    expect(consoleErrors).toEqual([]);
  });
});

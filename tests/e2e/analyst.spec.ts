import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserLaunch } from './browser-launch.js';
import { pageOpen } from './page-setup.js';
import { serverStart, type RunningServer } from './server-start.js';
import { passwordSignIn } from './sign-in.js';

// The invented demo analyst of the fictional Larchloaf chain (apps/server/src/seed/demo-seed.ts).
const ANALYST = { email: 'analyst@larchloaf.example', password: 'larchloaf-demo-2027' };
const WORKSPACE = 'Quillport north corridor 2027';

const here = dirname(fileURLToPath(import.meta.url));
const artifacts = join(here, 'artifacts');
// 300 invented customers around Quillport plus four bad rows; its coordinate headers
// (easting_deg, northing_deg) are not recognised, so the analyst has to map them.
const customersCsv = join(here, 'fixtures', 'analyst-customers.csv');

describe('the analyst’s day in a real browser', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let page: Page;
  const pageErrors: string[] = [];

  const shot = (name: string) => page.screenshot({ path: join(artifacts, `${name}.png`), fullPage: true });

  beforeAll(async () => {
    mkdirSync(artifacts, { recursive: true });
    server = await serverStart({ googleEmail: 'nobody@larchloaf.example', googleName: 'Nobody', demoSeed: true });
    context = await browserLaunch();
    page = await pageOpen(context, pageErrors);
  });

  afterAll(async () => {
    await context?.close();
    await server?.stop();
  });

  it('signs in as the demo analyst and opens the demo study on the customers step', async () => {
    await passwordSignIn(page, server.baseUrl, ANALYST);
    await page.getByRole('link', { name: new RegExp(WORKSPACE) }).click();
    await page.getByRole('heading', { name: '1 · Customers' }).waitFor();
    await page.getByText('up to 200 MB').waitFor();
  });

  it('uploads a customer file whose coordinate columns must be mapped by hand', async () => {
    await page.getByLabel('Choose a CSV or XLSX file').setInputFiles(customersCsv);
    const lon = page.getByLabel('Longitude column');
    await lon.waitFor();
    // The headers are not recognised: nothing is pre-filled for the coordinates, the weight is.
    expect(await lon.inputValue()).toBe('');
    expect(await page.getByLabel('Weight column (optional)').inputValue()).toBe('annual_spend');
    await page.getByText('Only coordinates and the weight are kept').first().waitFor();
    await shot('analyst-01-mapping');

    await page.getByRole('button', { name: 'Import' }).click();
    await page.getByText(/Choose the column that holds the longitude/).waitFor();
    await lon.selectOption('easting_deg');
    await page.getByLabel('Latitude column').selectOption('northing_deg');
    await page.getByLabel('The weight is').selectOption('spend');
    await page.getByLabel('Weight label (optional)').fill('annual spend (€)');
    await page.getByRole('button', { name: 'Import' }).click();
  });

  it('shows the validation report with the bad rows explained', async () => {
    const report = page.getByRole('region', { name: 'Validation report' });
    await report.waitFor({ timeout: 30_000 });
    const stat = (label: string) => report.locator('dl', { hasText: label }).first().textContent();
    expect(await stat('Accepted')).toContain('300rows');
    expect(await stat('Rejected')).toContain('4rows');
    await report.getByText('Placed at 0°, 0°').waitFor();
    await report.getByText('Longitude and latitude look swapped').waitFor();
    await report.getByRole('link', { name: 'Download rejected rows (CSV)' }).waitFor();
    await shot('analyst-02-validation-report');
  });

  it('sets up a surface with a live estimate and starts it', async () => {
    await page.getByRole('button', { name: /Demand surface/ }).first().click();
    await page.getByRole('heading', { name: '2 · Demand surface' }).waitFor();
    const estimate = page.getByRole('region', { name: 'Estimate' });
    await estimate.waitFor({ timeout: 30_000 });
    await estimate.getByText('Kernel radius').waitFor();
    const start = page.getByRole('button', { name: /^Start \(\d+ credits?\)$/ });
    await start.waitFor();
    await shot('analyst-03-surface-form');
    await start.click();
  });

  it('follows the run to the end and shows the surface on the map with its legend', async () => {
    const run = page.getByRole('article', { name: /Demand surface / }).first();
    await run.waitFor();
    await run.getByText('Ready').waitFor({ timeout: 60_000 });
    await run.getByText('90 %').waitFor();
    const map = page.locator('section[aria-label="Map"]');
    await map.locator('canvas').first().waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'On the map', exact: true }).waitFor();
    await map.getByText('Percent-volume contours').waitFor();
    await map.scrollIntoViewIfNeeded();
    // WebGL through SwiftShader on a shared CPU: capture the viewport only, with time to render.
    await page.screenshot({ path: join(artifacts, 'analyst-04-surface-on-map.png'), timeout: 90_000 });
    expect(pageErrors).toEqual([]);
  }, 180_000);
});

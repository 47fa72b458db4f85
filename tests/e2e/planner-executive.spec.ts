import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserLaunch } from './browser-launch.js';
import { freePort } from './free-port.js';
import { pageOpen } from './page-setup.js';
import { serverStart, type RunningServer } from './server-start.js';
import { passwordSignIn } from './sign-in.js';

// The invented demo people and study of the fictional Larchloaf chain (apps/server/src/seed/demo-seed.ts).
const PLANNER = { email: 'planner@larchloaf.example', password: 'larchloaf-demo-2027' };
const EXECUTIVE = {
  email: 'executive@larchloaf.example',
  password: 'larchloaf-demo-2027',
  name: 'Odile Fairhaven',
};
const WORKSPACE = 'Quillport north corridor 2027';
// The seed gives the demo study 8 candidate sites, 6 own cafés and 9 competitor stores.
const SEEDED = { candidate: 8, own: 6, competitor: 9 };

const here = dirname(fileURLToPath(import.meta.url));
const artifacts = join(here, 'artifacts');
// Three invented candidates whose headers only the guessed mapping understands; no kind column.
const candidatesCsv = join(here, 'fixtures', 'quillport-candidates.csv');
const IMPORTED = ['Rookery Lane Depot', 'Saltmarsh Tram Sheds', 'Ropewalk Chapel Hall'];
const CLICKED = { name: 'Breakwater Kiosk', attractiveness: '95' };

/** A message as the mail catcher's REST API lists it (`GET /api/email`). */
type CaughtMail = { to: { address: string }[]; subject: string; text?: string; html?: string };

/** Seconds since `start`, one decimal, for the timing table printed at the end. */
const secondsSince = (start: number) => Math.round((Date.now() - start) / 100) / 10;

/**
 * Whether a number shown with three significant figures (the app's demand text, e.g. "12,400") is
 * `value` rounded that way: the difference is at most half a unit in the third significant figure.
 */
function roundsTo(shown: string, value: number): boolean {
  const parsed = Number(shown.replace(/,/g, ''));
  if (!Number.isFinite(parsed) || value === 0) return parsed === value;
  const step = 10 ** (Math.floor(Math.log10(Math.abs(value))) - 2);
  return Math.abs(parsed - value) <= step / 2 + 1e-9;
}

describe('the planner’s and the executive’s day in a real browser', () => {
  let server: RunningServer;
  let mailWebUrl = '';
  let context: BrowserContext | undefined;
  let page: Page;
  const pageErrors: string[] = [];
  const timings: Array<[string, number]> = [];
  let orgId = '';
  let workspaceId = '';
  let topThree: string[] = [];
  let candidateCount = 0;
  let shortlistName = '';

  const shot = (name: string, options: { fullPage?: boolean } = {}) =>
    page.screenshot({
      path: join(artifacts, `planner-executive-${name}.png`),
      fullPage: options.fullPage ?? true,
      timeout: 90_000,
    });
  const groupCount = (title: string) =>
    page
      .getByRole('region', { name: new RegExp(`^${title}`) })
      .locator('h4')
      .textContent();

  beforeAll(async () => {
    mkdirSync(artifacts, { recursive: true });
    const [stripePort, smtpPort, mailWebPort] = [
      await freePort(),
      await freePort(),
      await freePort(),
    ];
    mailWebUrl = `http://localhost:${mailWebPort}`;
    server = await serverStart({
      googleEmail: 'nobody@larchloaf.example',
      googleName: 'Nobody',
      demoSeed: true,
      env: {
        // The demo customer file and its queued surface, so the study can be scored.
        DEMO_CUSTOMERS: 'true',
        STRIPE_API_PORT: String(stripePort),
        // Mail goes to the mail catcher stand-in, whose REST API the executive's step reads.
        MAIL_TRANSPORT: 'smtp',
        SMTP_URL: `smtp://localhost:${smtpPort}`,
        MAIL_CATCHER_SMTP_PORT: String(smtpPort),
        MAIL_CATCHER_WEB_PORT: String(mailWebPort),
      },
    });
    context = await browserLaunch();
    page = await pageOpen(context, pageErrors, { defaultTimeout: 30_000 });
  });

  afterAll(async () => {
    await context?.close();
    await server?.stop();
    if (timings.length)
      console.log(['step | seconds', ...timings.map(([step, s]) => `${step} | ${s}`)].join('\n'));
  });

  it('signs the demo planner in, waits for the demo surface and opens the study on the sites step', async () => {
    const start = Date.now();
    await passwordSignIn(page, server.baseUrl, PLANNER);
    await page.getByRole('link', { name: new RegExp(WORKSPACE) }).click();
    await page.getByRole('heading', { name: '3 · Sites & scoring' }).waitFor();
    [, orgId, workspaceId] = /\/orgs\/([^/]+)\/workspaces\/([^/?#]+)/.exec(page.url()) ?? [];
    expect(orgId && workspaceId).toBeTruthy();

    // The seed queued one surface on the 30,000 demo customers; the planner may read its status.
    const surfacesUrl = `${server.baseUrl}/api/organizations/${orgId}/workspaces/${workspaceId}/surfaces`;
    await expect
      .poll(
        async () => {
          const body = (await (await page.request.get(surfacesUrl)).json()) as {
            surfaces: Array<{ status: string; error?: unknown }>;
          };
          const failed = body.surfaces.find((s) => s.status === 'failed');
          if (failed)
            throw new Error(
              `The demo surface failed: ${JSON.stringify(failed.error)}\n${server.output()}`,
            );
          return body.surfaces.map((s) => s.status).join(',');
        },
        { timeout: 150_000, interval: 1000 },
      )
      .toBe('succeeded');
    timings.push(['sign-in and demo surface (30,000 customers) ready', secondsSince(start)]);

    await page.reload();
    await page.getByRole('heading', { name: '3 · Sites & scoring' }).waitFor();
    expect(await groupCount('Candidate sites')).toContain(String(SEEDED.candidate));
    expect(await groupCount('Own stores')).toContain(String(SEEDED.own));
    expect(await groupCount('Competitor stores')).toContain(String(SEEDED.competitor));
    await page.locator('section[aria-label="Map"] canvas.maplibregl-canvas').first().waitFor();
    await shot('01-sites-step');
  }, 200_000);

  it('adds a candidate by clicking the map', async () => {
    await page.getByRole('button', { name: 'Add on map', exact: true }).click();
    await page.getByText('Click the map where the new site goes.').waitFor();
    const canvas = page.locator('section[aria-label="Map"] canvas.maplibregl-canvas').first();
    const box = (await canvas.boundingBox())!;
    // Upper left of the view, away from the demo sites near the centre (a click on a site selects it instead).
    await canvas.click({
      position: { x: Math.round(box.width * 0.18), y: Math.round(box.height * 0.2) },
    });
    const form = page.getByRole('form', { name: 'New site' });
    await form.waitFor();
    expect(await form.getByLabel('Longitude').inputValue()).toMatch(/^-?\d+\.\d+$/);
    expect(await form.getByLabel('Latitude').inputValue()).toMatch(/^-?\d+\.\d+$/);
    expect(await form.getByLabel('Kind').inputValue()).toBe('candidate');
    await form.getByLabel('Name', { exact: true }).fill(CLICKED.name);
    await form.getByLabel('Attractiveness', { exact: true }).fill(CLICKED.attractiveness);
    await shot('02-site-form-from-map');
    await form.getByRole('button', { name: 'Add site' }).click();
    await form.waitFor({ state: 'detached' });
    const candidates = page.getByRole('region', { name: /^Candidate sites/ });
    await candidates.getByRole('button', { name: new RegExp(`^${CLICKED.name}`) }).waitFor();
    await expect.poll(() => groupCount('Candidate sites')).toContain(String(SEEDED.candidate + 1));
    await page.getByRole('button', { name: 'Add on map: on' }).click();
  });

  it('imports three candidates from a CSV whose columns are guessed', async () => {
    await page.getByRole('button', { name: 'Import sites' }).click();
    const dialog = page.getByRole('dialog', { name: 'Import sites' });
    await dialog.getByLabel('Choose a CSV or XLSX file').setInputFiles(candidatesCsv);
    await dialog.getByLabel('Name column').waitFor();
    expect(await dialog.getByLabel('Name column').inputValue()).toBe('Site name');
    expect(await dialog.getByLabel('Longitude column').inputValue()).toBe('Longitude');
    expect(await dialog.getByLabel('Latitude column').inputValue()).toBe('Latitude');
    expect(await dialog.getByLabel('Kind column (optional)').inputValue()).toBe('');
    expect(await dialog.getByLabel('Default kind').inputValue()).toBe('candidate');
    await dialog.getByRole('cell', { name: IMPORTED[0] }).waitFor();
    await shot('03-import-mapping', { fullPage: false });
    if ((await dialog.getByLabel('Attractiveness column (optional)').inputValue()) === '') {
      await dialog.getByLabel('Attractiveness column (optional)').selectOption('Floor area (m²)');
    }
    await dialog.getByRole('button', { name: 'Import 3 sites' }).click();
    await page.getByText('Imported 3 sites.').waitFor();
    await expect.poll(() => groupCount('Candidate sites')).toContain(String(SEEDED.candidate + 4));
    const candidates = page.getByRole('region', { name: /^Candidate sites/ });
    for (const name of IMPORTED)
      await candidates.getByRole('button', { name: new RegExp(`^${name}`) }).waitFor();
  });

  it('shows the three kinds of site on the map with their legend', async () => {
    const map = page.locator('section[aria-label="Map"]');
    const legend = map.getByRole('list', { name: 'Site symbols' });
    await legend.getByText(`(${SEEDED.candidate + 4})`).waitFor();
    for (const label of ['Candidate site', 'Own store', 'Competitor store'])
      await legend.getByText(label, { exact: true }).waitFor();
    await map.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    // WebGL through SwiftShader on a shared CPU: give the symbols time to draw, capture the map only.
    await page.waitForTimeout(2000);
    await map.screenshot({
      path: join(artifacts, 'planner-executive-04-map-sites-legend.png'),
      timeout: 90_000,
    });
  });

  it('scores the candidates against the demo surface and explains the ranking', async () => {
    const start = Date.now();
    const scoring = page.getByRole('region', { name: 'Score the candidates' });
    await scoring.getByRole('button', { name: 'Score sites' }).click();
    const table = page.getByRole('table', { name: /^Candidates ranked by/ });
    await table.waitFor({ timeout: 90_000 });
    timings.push(['scoring run (12 candidates), click to ranking', secondsSince(start)]);
    candidateCount = SEEDED.candidate + 4;
    const rows = table.locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(candidateCount);
    const ranks = await rows.locator('td:nth-child(2)').allTextContents();
    expect(ranks.map(Number)).toEqual(Array.from({ length: candidateCount }, (_, k) => k + 1));
    const names = await rows.locator('td:nth-child(3) button').allTextContents();
    // Every candidate is ranked: the seeded ones, the one placed on the map and the imported ones.
    expect(new Set(names).size).toBe(candidateCount);
    expect(names).toEqual(expect.arrayContaining([CLICKED.name, ...IMPORTED]));
    topThree = names.slice(0, 3);

    await table.getByRole('button', { name: topThree[0], exact: true }).click();
    const why = page.locator(`[aria-label="Why ${topThree[0]} ranks 1"]`);
    await why.getByText(/^Captured [\d,.]+ .* = net new [\d,.]+/).waitFor();
    expect((await why.locator('p').first().textContent())?.length ?? 0).toBeGreaterThan(20);
    await shot('05-ranking-explained');
  }, 150_000);

  it('checks the rank stability at other bandwidths', async () => {
    const start = Date.now();
    const stability = page.getByRole('region', { name: 'Rank stability' });
    await stability.getByRole('button', { name: 'Check rank stability' }).click();
    await stability.getByText(/Agreement with the run’s ranking/).waitFor({ timeout: 120_000 });
    timings.push(['rank stability (4 bandwidths)', secondsSince(start)]);
    const tau = await stability.getByText(/× bandwidth \([\d,]+ m\): τ = /).allTextContents();
    expect(tau).toHaveLength(4);
    await stability.scrollIntoViewIfNeeded();
    await shot('06-rank-stability');
  }, 150_000);

  it('builds a shortlist from the top three with a note, saves it and shares it with the executives', async () => {
    await page
      .getByRole('list', { name: 'Study steps' })
      .getByRole('button', { name: /Shortlist/ })
      .click();
    await page.getByRole('heading', { name: '4 · Shortlist' }).waitFor();
    await page.getByRole('button', { name: 'New shortlist' }).click();
    const builder = page.getByRole('form', { name: 'New shortlist' });
    for (const name of topThree)
      await builder.getByRole('checkbox', { name: `Choose ${name}`, exact: true }).check();
    const order = builder.getByRole('list', { name: 'Shortlist order' });
    await expect.poll(() => order.locator('> li').count()).toBe(3);
    await builder
      .getByLabel(`Note for ${topThree[0]}`)
      .fill('Strongest net new demand; ask the landlord about a terrace.');
    shortlistName = 'Quillport north: board shortlist';
    await builder.getByLabel('Shortlist name').fill(shortlistName);
    await builder.getByLabel('Version note (optional)').fill('Top three of the first scoring run.');
    await shot('07-shortlist-builder');
    await builder.getByRole('button', { name: 'Save shortlist' }).click();
    await page.getByRole('heading', { name: shortlistName }).waitFor();

    await page.getByRole('button', { name: 'Share with executives' }).click();
    const dialog = page.getByRole('dialog', { name: 'Share with executives' });
    await dialog
      .getByLabel('Message (optional)')
      .fill('For Thursday’s board: please read the three sites.');
    await dialog.getByRole('button', { name: 'Send to executives' }).click();
    await dialog.getByText('Sent to 1 person').waitFor();
    await dialog.getByRole('list', { name: 'Sent to' }).getByText(EXECUTIVE.name).waitFor();
    await dialog.getByText(EXECUTIVE.email).waitFor();
    await shot('08-shared', { fullPage: false });
    await dialog.getByRole('button', { name: 'Done' }).click();
    expect(pageErrors).toEqual([]);
  });

  it('lets the executive open the shared shortlist from the e-mail and read it without edit controls', async () => {
    let link = '';
    await expect
      .poll(
        async () => {
          const mails = (await (await fetch(`${mailWebUrl}/api/email`)).json()) as CaughtMail[];
          const mail = mails.find((m) => m.to.some((t) => t.address === EXECUTIVE.email));
          const match = /https?:\/\/[^\s"'<>]+\/orgs\/[^/\s"'<>]+\/shortlists\/[A-Za-z0-9_-]+/.exec(
            `${mail?.text ?? ''} ${mail?.html ?? ''}`,
          );
          link = match ? match[0] : '';
          return link;
        },
        { timeout: 20_000 },
      )
      .toContain(`/orgs/${orgId}/shortlists/`);

    // A new browser: the executive follows the link, signs in and is brought back to the shortlist.
    await context?.close();
    context = await browserLaunch();
    page = await pageOpen(context, pageErrors, { defaultTimeout: 30_000 });
    await page.goto(link);
    await page.getByLabel('E-mail').fill(EXECUTIVE.email);
    await page.getByLabel('Password').fill(EXECUTIVE.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: shortlistName, level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe(new URL(link).pathname);

    const ranked = page.getByRole('table', { name: 'Shortlisted sites' });
    const rows = ranked.locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(3);
    expect(await rows.locator('th').allTextContents()).toEqual(topThree);
    expect(await rows.first().locator('td').nth(1).textContent()).toBe(`1 of ${candidateCount}`);
    // The planner checked rank stability before saving: the version carries each site's rank range.
    for (const cell of await rows.locator('td:last-child').allTextContents())
      expect(cell).toMatch(/^ranks? \d/);
    const notes = page.getByRole('list', { name: 'Notes and explanations per site' });
    await notes.getByText('Strongest net new demand; ask the landlord about a terrace.').waitFor();
    expect(await notes.locator('dd').nth(1).textContent()).toMatch(/^Captures /);
    await page.getByText('Before anyone signs a lease').waitFor();
    await page
      .getByText(/estimate/)
      .first()
      .waitFor();
    // Read only: nothing to type into, no site to tick (the map's contour switches are views, not edits).
    expect(await page.getByRole('textbox').count()).toBe(0);
    for (const region of ['Ranked sites', 'Why each site']) {
      expect(await page.getByRole('region', { name: region }).getByRole('checkbox').count()).toBe(
        0,
      );
    }
    for (const control of [
      'Edit in workspace',
      'Share with executives',
      'Edit sites, order and notes',
      'Rename',
      'Delete',
    ]) {
      expect(
        await page
          .getByRole('link', { name: control })
          .or(page.getByRole('button', { name: control }))
          .count(),
      ).toBe(0);
    }
    const map = page.locator('section[aria-label="Map"]');
    await map.locator('canvas.maplibregl-canvas').first().waitFor();
    // Without the customer file (executives get none) the legend still names the demo weight.
    await map.getByText('(annual spend (€) per km²)').waitFor();
    expect(await map.getByText(/customers per km²/).count()).toBe(0);
    await map.getByRole('list', { name: 'Site symbols' }).getByText('(3)').waitFor();
    await page.waitForTimeout(2000);
    await shot('09-executive-shortlist');
  }, 120_000);

  it('downloads the shortlist report as XLSX whose summary agrees with the page', async () => {
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Shortlist report (XLSX)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
    const path = join(artifacts, 'planner-executive-shortlist.xlsx');
    await download.saveAs(path);

    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(path);
    const summary = workbook.getWorksheet('Summary');
    expect(summary).toBeDefined();
    let headerRow = 0;
    summary!.eachRow((row, n) => {
      if (headerRow === 0 && row.getCell(1).value === 'Site') headerRow = n;
    });
    expect(headerRow).toBeGreaterThan(0);
    const headers = (summary!.getRow(headerRow).values as unknown[]).map((v) =>
      typeof v === 'string' ? v : '',
    );
    const netNewColumn = headers.indexOf('Net new');
    expect(netNewColumn).toBeGreaterThan(0);
    const first = summary!.getRow(headerRow + 1);
    const pageFirst = page
      .getByRole('table', { name: 'Shortlisted sites' })
      .locator('tbody tr')
      .first();
    expect(first.getCell(1).value).toBe(await pageFirst.locator('th').textContent());
    const netNew = first.getCell(netNewColumn).value as number;
    expect(typeof netNew).toBe('number');
    const shown = (await pageFirst.locator('td').nth(2).textContent()) ?? '';
    expect(roundsTo(shown, netNew), `page shows ${shown}, XLSX holds ${netNew}`).toBe(true);
    expect(first.getCell(netNewColumn).numFmt).toBeTruthy();
    expect(pageErrors).toEqual([]);
  });
});

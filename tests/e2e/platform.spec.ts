import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserLaunch } from './browser-launch.js';
import { pageOpen } from './page-setup.js';
import { serverStart, type RunningServer } from './server-start.js';

// Invented people of the fictional Larchloaf chain; nothing here is real.
const OWNER = { name: 'Wren Applegarth', email: 'wren@larchloaf.test', password: 'tidewater-larch-42' };
const GOOGLE = { name: 'Maren Larchwood', email: 'maren@larchloaf.test' };

const artifacts = join(dirname(fileURLToPath(import.meta.url)), 'artifacts');

describe('the platform in a real browser', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let page: Page;
  const pageErrors: string[] = [];

  const shot = (name: string) => page.screenshot({ path: join(artifacts, `${name}.png`), fullPage: true });

  beforeAll(async () => {
    mkdirSync(artifacts, { recursive: true });
    server = await serverStart({ googleEmail: GOOGLE.email, googleName: GOOGLE.name });
    context = await browserLaunch();
    page = await pageOpen(context, pageErrors, { defaultTimeout: 60_000 });
  });

  afterAll(async () => {
    await context?.close();
    await server?.stop();
  });

  it('sends a signed-out visitor from a deep link to sign-in', async () => {
    await page.goto(`${server.baseUrl}/account`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).searchParams.get('redirectTo')).toBe('/account');
    await shot('01-sign-in');
  });

  it('signs up with e-mail and password and returns to the page first asked for', async () => {
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByRole('heading', { name: 'Create your account' }).waitFor();
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Use at least 10 characters.').waitFor();
    await shot('02-sign-up-field-errors');

    await page.getByLabel('Your name').fill(OWNER.name);
    await page.getByLabel('Work e-mail').fill(OWNER.email);
    await page.getByLabel('Password', { exact: true }).fill(OWNER.password);
    await page.getByLabel('Password, again').fill(OWNER.password);
    await page.getByRole('button', { name: 'Create account' }).click();
    // The deep link the visitor started from is honoured after sign-up.
    await page.getByRole('heading', { name: 'Account', level: 1 }).waitFor();
    await page.getByText('Not verified').waitFor();
    expect(await page.locator('#main').textContent()).toContain(OWNER.email);
    await shot('03-account-after-sign-up');
  });

  it('creates the first organization', async () => {
    await page.goto(`${server.baseUrl}/`);
    await page.getByRole('heading', { name: `Welcome, ${OWNER.name}` }).waitFor();
    await page.getByLabel('Organization name').fill('Larchloaf');
    await page.getByRole('button', { name: 'Create organization' }).click();
    await page.getByRole('heading', { name: 'Workspaces', exact: true }).waitFor();
    await page.getByText('No workspaces yet').waitFor();
    await page.getByRole('link', { name: 'Audit log' }).waitFor();
    await shot('04-workspaces-empty');
  });

  it('signs out and back in with the password', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.getByLabel('E-mail').fill(OWNER.email);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is incorrect.').waitFor();
    await shot('05-sign-in-wrong-password');

    await page.getByLabel('Password').fill(OWNER.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Workspaces', exact: true }).waitFor();
    await page.getByRole('button', { name: /Larchloaf/ }).waitFor();
  });

  it('signs in with the Google stand-in as a new person', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.getByRole('link', { name: 'Continue with Google' }).click();
    await page.getByRole('heading', { name: `Welcome, ${GOOGLE.name}` }).waitFor();
    await shot('06-google-welcome');
  });

  it('creates an organization and a workspace and opens the study outline', async () => {
    await page.getByLabel('Organization name').fill('Quillport Harbour Bakes');
    await page.getByRole('button', { name: 'Create organization' }).click();
    await page.getByRole('heading', { name: 'Workspaces', exact: true }).waitFor();

    await page.getByRole('button', { name: 'New workspace' }).first().click();
    const dialog = page.getByRole('dialog', { name: 'New workspace' });
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Create workspace' }).click();
    await dialog.getByText('Give the study a name').waitFor();
    await dialog.getByLabel('Name').fill('North corridor 2027');
    await dialog.getByLabel('Description (optional)').fill('Where the seventh Larchloaf café should open in Quillport.');
    await shot('07-new-workspace-dialog');
    await dialog.getByRole('button', { name: 'Create workspace' }).click();

    await page.getByRole('heading', { name: 'North corridor 2027', level: 1 }).waitFor();
    await page.getByText('The map is empty until the study has data').waitFor();
    await expect(page.getByText('Not started').count()).resolves.toBe(4);
    await shot('08-workspace');

    await page.getByRole('link', { name: '← Workspaces' }).click();
    await page.getByRole('link', { name: /North corridor 2027/ }).waitFor();
    await shot('09-workspace-list');
  });

  it('records the work in the owner’s audit log', async () => {
    await page.getByRole('link', { name: 'Audit log' }).click();
    await page.getByRole('heading', { name: 'Audit log', level: 1 }).waitFor();
    await page.getByRole('cell', { name: /Created a workspace/ }).waitFor();
    await shot('10-audit-log');
    expect(pageErrors).toEqual([]);
  });
});

import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserLaunch } from './browser-launch.js';
import { freePort } from './free-port.js';
import { pageOpen } from './page-setup.js';
import { serverStart, type RunningServer } from './server-start.js';
import { passwordSignIn } from './sign-in.js';

// The seeded demo people of the invented Larchloaf chain (apps/server/src/seed/demo-seed.ts).
const OWNER = { email: 'owner@larchloaf.example', password: 'larchloaf-demo-2027', name: 'Maren Larchwood' };
const ORG = 'Larchloaf Bakery-Cafés';
const INVITEE = { name: 'Sable Quillon', email: 'sable@larchloaf.test', password: 'harbour-rye-loaf-77' };

const artifacts = join(dirname(fileURLToPath(import.meta.url)), 'artifacts');

/** A message as the mail catcher's REST API lists it (`GET /api/email`). */
type CaughtMail = { to: { address: string }[]; subject: string; text?: string; html?: string };

describe('the owner’s screens in a real browser', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let page: Page;
  let mailWebUrl = '';
  let invitationLink = '';
  const pageErrors: string[] = [];

  const shot = (name: string) => page.screenshot({ path: join(artifacts, `owner-${name}.png`), fullPage: true });
  const balance = () => page.getByTestId('credit-balance');

  /** Pays on the payment stand-in's hosted test page, first with the declined card when asked. */
  async function payOnTestPage(heading: string, screenshotPrefix: string, tryDeclined: boolean) {
    await page.getByRole('heading', { name: heading }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/checkout\/cs_test_/);
    await shot(`${screenshotPrefix}-checkout`);
    if (tryDeclined) {
      await page.getByLabel('Card number').fill('4000 0000 0000 0002');
      await page.getByRole('button', { name: /^Pay / }).click();
      await page.getByText('Your card was declined.').waitFor();
      await shot(`${screenshotPrefix}-declined`);
    }
    await page.getByLabel('Card number').fill('4242 4242 4242 4242');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.getByRole('heading', { name: 'Billing', level: 1 }).waitFor();
  }

  beforeAll(async () => {
    mkdirSync(artifacts, { recursive: true });
    const [stripePort, smtpPort, mailWebPort] = [await freePort(), await freePort(), await freePort()];
    mailWebUrl = `http://localhost:${mailWebPort}`;
    server = await serverStart({
      googleEmail: 'maren@larchloaf.test',
      googleName: OWNER.name,
      demoSeed: true,
      env: {
        // Own ports for the payment stand-in and the mail catcher, so parallel runs do not meet.
        STRIPE_API_PORT: String(stripePort),
        MAIL_TRANSPORT: 'smtp',
        SMTP_URL: `smtp://localhost:${smtpPort}`,
        MAIL_CATCHER_SMTP_PORT: String(smtpPort),
        MAIL_CATCHER_WEB_PORT: String(mailWebPort),
      },
    });
    context = await browserLaunch();
    page = await pageOpen(context, pageErrors);
  });

  afterAll(async () => {
    await context?.close();
    await server?.stop();
  });

  it('signs the demo owner in and shows billing with the demo credits', async () => {
    await passwordSignIn(page, server.baseUrl, OWNER);
    await page.getByRole('link', { name: 'Billing' }).click();
    await page.getByRole('heading', { name: 'Billing', level: 1 }).waitFor();
    await expect.poll(() => balance().textContent()).toBe('500');
    await page.getByText('Demo plan (not billed)').waitFor();
    await shot('01-billing');
  });

  it('buys a credit pack through the test checkout page (declined card first) and sees the balance rise once', async () => {
    await page.getByRole('button', { name: 'Buy 500 credits for €60.00' }).click();
    await payOnTestPage('Pay once', '02-credits', true);
    await expect.poll(() => balance().textContent(), { timeout: 20_000 }).toBe('1,000');
    await page.getByText('500 credits added').waitFor();
    await page.getByRole('cell', { name: '500-credit pack' }).waitFor();
    await page.getByRole('cell', { name: '€60.00' }).waitFor();
    expect(new URL(page.url()).search).toBe('');
    await shot('03-credits-arrived');
  });

  it('is told that every seat is taken when inviting, and is sent to billing', async () => {
    await page.getByRole('link', { name: 'Members' }).click();
    await page.getByRole('heading', { name: 'Members', level: 1 }).waitFor();
    await page.getByLabel('E-mail').fill(INVITEE.email);
    await page.getByLabel('Role', { exact: true }).selectOption('analyst');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(/All 4 paid seats are used|seat plan/).first().waitFor();
    await shot('04-seats-exhausted');
    await page.getByRole('link', { name: 'Go to billing' }).click();
    await page.getByRole('heading', { name: 'Billing', level: 1 }).waitFor();
  });

  it('starts a paid seat plan with 6 seats, seeing the monthly total first', async () => {
    const form = page.getByRole('form', { name: 'Start a seat plan' });
    await form.getByLabel('Seats for the new plan').fill('6');
    await form.getByText('New monthly total: 6 seats × €39.00 = €234.00 per month').waitFor();
    await shot('05-seat-plan-total');
    await form.getByRole('button', { name: 'Start plan with 6 seats' }).click();
    await payOnTestPage('Start subscription', '06-seats', false);
    await page.getByText('Seat plan started with 6 seats').waitFor({ timeout: 20_000 });
    await page.getByRole('form', { name: 'Change seats' }).waitFor();
    await shot('07-seat-plan-active');
  });

  it('invites an analyst, whose e-mail holds a one-time link', async () => {
    await page.getByRole('link', { name: 'Members' }).click();
    await page.getByLabel('E-mail').fill(INVITEE.email);
    await page.getByLabel('Role', { exact: true }).selectOption('analyst');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${INVITEE.email}.`).waitFor();
    await page.getByRole('button', { name: `Revoke the invitation to ${INVITEE.email}` }).waitFor();
    await shot('08-invitation-sent');

    await expect
      .poll(
        async () => {
          const mails = (await (await fetch(`${mailWebUrl}/api/email`)).json()) as CaughtMail[];
          const mail = mails.find((m) => m.to.some((t) => t.address === INVITEE.email));
          const match = /https?:\/\/[^\s"'<>]+\/invitations\/accept\?token=[A-Za-z0-9_-]+/.exec(`${mail?.text ?? ''} ${mail?.html ?? ''}`);
          invitationLink = match ? match[0].replace(/&amp;/g, '&') : '';
          return invitationLink;
        },
        { timeout: 15_000 },
      )
      .toMatch(/\/invitations\/accept\?token=/);
  });

  it('lets the invitee sign up from the link and join the organization as analyst', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.goto(invitationLink);
    await page.getByText(`${OWNER.name} invites you to join ${ORG} on Demandscape as Analyst.`).waitFor();
    await shot('09-invitation-signed-out');

    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByLabel('Your name').fill(INVITEE.name);
    await page.getByLabel('Work e-mail').fill(INVITEE.email);
    await page.getByLabel('Password', { exact: true }).fill(INVITEE.password);
    await page.getByLabel('Password, again').fill(INVITEE.password);
    await page.getByRole('button', { name: 'Create account' }).click();

    await page.getByRole('button', { name: `Join ${ORG}` }).click();
    await page.getByRole('heading', { name: 'Workspaces', exact: true }).waitFor();
    await page.getByText(`Welcome to ${ORG}`).waitFor();
    await page.getByRole('link', { name: 'Members' }).waitFor();
    expect(await page.getByRole('link', { name: 'Billing' }).count()).toBe(0);
    await shot('10-joined-as-analyst');
    expect(pageErrors).toEqual([]);
  });
});

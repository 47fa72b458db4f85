import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/**
 * Starts Debian's Chromium headless with a fresh profile. The networking flags keep it from calling
 * out (this machine has no internet; without them it retries blocked connections).
 * @returns a browser context; close it to end the browser
 * @example const context = await browserLaunch(); const page = await context.newPage();
 */
export async function browserLaunch(): Promise<BrowserContext> {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`No Chromium at ${CHROMIUM}: install it with \`apt-get install -y chromium\` (.ci/run does) or set CHROMIUM_PATH.`);
  }
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'demandscape-chromium-')), {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1360, height: 860 },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

import type { BrowserContext, Page } from 'playwright-core';

/**
 * The browser's first tab (or a new one), reporting every uncaught page error into `pageErrors` so a
 * spec can assert at the end that the app threw nothing.
 * @param context - the browser context from `browserLaunch()`
 * @param pageErrors - list that receives the message of each uncaught page error
 * @param options - `defaultTimeout` in milliseconds for every wait on the page (Playwright's own default when left out)
 * @returns the page
 * @example
 * const context = await browserLaunch(); const page = await pageOpen(context, pageErrors, { defaultTimeout: 60_000 });
 */
export async function pageOpen(context: BrowserContext, pageErrors: string[], options: { defaultTimeout?: number } = {}): Promise<Page> {
  const page = context.pages()[0] ?? (await context.newPage());
  if (options.defaultTimeout !== undefined) page.setDefaultTimeout(options.defaultTimeout);
  page.on('pageerror', (error) => pageErrors.push(error.message));
  return page;
}

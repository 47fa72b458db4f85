import type { Page } from 'playwright-core';

/**
 * Signs in on the sign-in page with e-mail and password and waits until home has sent the person on
 * to the organization's workspaces (navigate only after that redirect, or it overrides the next click).
 * @param page - the browser page
 * @param baseUrl - the running server's address, e.g. `http://localhost:41234`
 * @param person - the account's e-mail and password
 * @returns once the workspaces heading shows
 * @example
 * await passwordSignIn(page, server.baseUrl, { email: 'analyst@larchloaf.example', password: 'larchloaf-demo-2027' });
 */
export async function passwordSignIn(page: Page, baseUrl: string, person: { email: string; password: string }): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Workspaces', exact: true }).waitFor();
}

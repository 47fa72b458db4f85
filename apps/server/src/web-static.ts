import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';

/**
 * Serves the built web app (if `webDist/index.html` exists) with SPA fallback: any GET outside
 * `/api` that is not a file gets index.html.
 * @param app - the express app
 * @param webDist - folder of the built web app
 * @returns true when the web app is served
 * @example
 * webStaticMount(app, '/srv/demandscape/apps/web/dist');
 */
export function webStaticMount(app: Express, webDist: string): boolean {
  const index = join(webDist, 'index.html');
  if (!existsSync(index)) return false;
  app.use(express.static(webDist, { index: false, maxAge: '1h' }));
  app.get(/^(?!\/api(?:\/|$)).*/, (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return true;
}

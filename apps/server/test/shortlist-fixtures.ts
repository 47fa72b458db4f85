import type { DemandscapeApp } from '../src/app.js';
import type { ScoringRunJson } from '../src/modules/scoring/scoring.types.js';
import { customerFileStored, demoPoints, QUILLPORT, surfaceStored } from './surface-fixtures.js';
import type { TestClient } from './utils.js';

/** lon/lat `e` km east and `n` km north of Quillport's centre (flat-earth offsets; invented places). */
function at(e: number, n: number): { lon: number; lat: number } {
  const mPerDegLat = 111_320;
  return {
    lon: QUILLPORT.lon + (e * 1000) / (mPerDegLat * Math.cos((QUILLPORT.lat * Math.PI) / 180)),
    lat: QUILLPORT.lat + (n * 1000) / mPerDegLat,
  };
}

/** Invented Larchloaf sites: three candidates, two own stores, one competitor. */
export const SHORTLIST_SITES = [
  {
    kind: 'candidate',
    name: 'Quay corner',
    ...at(0.3, 0.2),
    attractiveness: 120,
    attractivenessLabel: 'sales floor m²',
    notes: 'Corner unit, glass front',
  },
  {
    kind: 'candidate',
    name: 'Lantern Hill',
    ...at(3.4, 1.6),
    attractiveness: 90,
    attractivenessLabel: 'sales floor m²',
  },
  {
    kind: 'candidate',
    name: '=Saltmarsh Lane',
    ...at(-2.3, -2.1),
    attractiveness: 150,
    attractivenessLabel: 'sales floor m²',
  },
  {
    kind: 'own',
    name: 'Harbour Row',
    ...at(-0.5, -0.3),
    attractiveness: 140,
    attractivenessLabel: 'sales floor m²',
  },
  {
    kind: 'own',
    name: 'Tidewater Market',
    ...at(2.8, 2.2),
    attractiveness: 110,
    attractivenessLabel: 'sales floor m²',
  },
  {
    kind: 'competitor',
    name: 'Rival Crumb',
    ...at(-1.8, -1.2),
    attractiveness: 160,
    attractivenessLabel: 'sales floor m²',
  },
] as const;

/**
 * A workspace with a stored succeeded surface (2,000 seeded demo points), the sites above and one
 * succeeded scoring run, made through the real routes (the run is computed by the scoring runner).
 * @param ds - the app
 * @param client - an owner or planner of the organization
 * @param orgId - the organization
 * @returns workspace base path, ids and site ids by name
 * @example
 * const w = await scoredWorkspace(ds, planner, orgId);
 */
export async function scoredWorkspace(
  ds: DemandscapeApp,
  client: TestClient,
  orgId: string,
): Promise<{
  base: string;
  wsId: string;
  runId: string;
  surfaceId: string;
  siteIds: Record<string, string>;
}> {
  const wsId = (
    await client
      .post(`/api/organizations/${orgId}/workspaces`, { name: 'North corridor 2027' })
      .expect(201)
  ).body.workspace.id as string;
  const points = demoPoints(2000, 11);
  const fileId = await customerFileStored(ds, orgId, wsId, points);
  const surfaceId = await surfaceStored(ds, { orgId, wsId, fileId }, points, 'succeeded');
  const base = `/api/organizations/${orgId}/workspaces/${wsId}`;
  const siteIds: Record<string, string> = {};
  for (const s of SHORTLIST_SITES)
    siteIds[s.name] = (await client.post(`${base}/sites`, s).expect(201)).body.site.id;
  const runId = (
    await client.post(`${base}/scoring-runs`, { surfaceId, name: 'Harbour run' }).expect(202)
  ).body.run.id as string;
  await scoringRunFinished(client, `${base}/scoring-runs/${runId}`);
  return { base, wsId, runId, surfaceId, siteIds };
}

/**
 * Polls a scoring run until it has succeeded (throws when it failed or takes longer than the limit).
 * @param client - a reader
 * @param path - the run's URL
 * @param timeoutMs - limit (default 60 s)
 * @returns the run JSON
 * @example
 * const run = await scoringRunFinished(owner, `${base}/scoring-runs/${id}`);
 */
export async function scoringRunFinished(
  client: TestClient,
  path: string,
  timeoutMs = 60_000,
): Promise<ScoringRunJson> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const run = (await client.get(path).expect(200)).body.run as ScoringRunJson;
    if (run.status === 'succeeded') return run;
    if (run.status === 'failed')
      throw new Error(`scoring run failed: ${JSON.stringify(run.error)}`);
    if (Date.now() > until)
      throw new Error(`scoring run still ${run.status} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

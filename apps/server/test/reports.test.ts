import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import type { ScoringRunJson } from '../src/modules/scoring/scoring.types.js';
import { SHORTLIST_CAUTION } from '../src/modules/shortlist/shortlist-caution.js';
import { scoredWorkspace } from './shortlist-fixtures.js';
import { testAppCreate, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

function binary(res: Response, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

async function workbookOf(body: Buffer): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(body as unknown as ArrayBuffer);
  return wb;
}

describe(
  'reports: ranking XLSX, CSV and GeoJSON of a run; shortlist XLSX',
  { timeout: 120_000 },
  () => {
    let ds: DemandscapeApp;
    let planner: TestClient;
    let executive: TestClient;
    let orgId: string;
    let w: Awaited<ReturnType<typeof scoredWorkspace>>;
    let run: ScoringRunJson;

    beforeAll(async () => {
      ds = await testAppCreate();
      planner = (await testUserSignedIn(ds, 'pia@larchloaf.example', 'Pia Planner')).client;
      orgId = (await planner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body
        .organization.id;
      w = await scoredWorkspace(ds, planner, orgId);
      run = (await planner.get(`${w.base}/scoring-runs/${w.runId}`).expect(200)).body.run;
      const exec = await testUserSignedIn(ds, 'eve@larchloaf.example', 'Eve Executive');
      await testMembershipAdd(ds, orgId, exec.userId, 'executive');
      executive = exec.client;
    });
    afterAll(() => ds.close());

    const runPath = () => `${w.base}/scoring-runs/${w.runId}`;

    it('the executive downloads the ranking XLSX: summary values, formats, widths and one sheet per candidate', async () => {
      const res = await executive
        .get(`${runPath()}/export.xlsx`)
        .buffer(true)
        .parse(binary)
        .expect(200);
      expect(res.headers['content-type']).toBe(
        'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      );
      expect(res.headers['content-disposition']).toBe(
        'attachment; filename="demandscape-north-corridor-2027-harbour-run-ranking.xlsx"',
      );
      const wb = await workbookOf(res.body as Buffer);
      expect(wb.worksheets).toHaveLength(1 + run.results!.candidates.length);
      const summary = wb.getWorksheet('Summary')!;
      let header = 0;
      summary.eachRow((row, n) => {
        if (row.getCell(1).value === 'Site') header = n;
      });
      const best = run.results!.candidates[0];
      const first = summary.getRow(header + 1);
      expect(first.getCell(1).value).toBe(best.name);
      expect(first.getCell(5).value).toBe(best.cannibalization);
      expect(first.getCell(5).numFmt).toBe('#,##0');
      expect(first.getCell(7).numFmt).toBe('0.0%');
      expect(summary.getColumn(1).width).toBe(34);
      const siteSheet = wb.worksheets[1];
      expect(siteSheet.name).toBe(`1 ${best.name}`);
      expect(siteSheet.getColumn(3).width).toBe(60);
    });

    it('the ranking CSV parses back to the run’s ranking; a formula-like name is neutralised', async () => {
      const res = await executive.get(`${runPath()}/ranking.csv`).expect(200);
      expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(res.headers['content-disposition']).toMatch(
        /filename="demandscape-north-corridor-2027-harbour-run-ranking\.csv"/,
      );
      const parsed = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, ''), {
        skipEmptyLines: true,
      });
      expect(parsed.errors).toEqual([]);
      const [head, ...rows] = parsed.data;
      expect(head.slice(0, 5)).toEqual(['rank', 'name', 'lon', 'lat', 'value (net new demand)']);
      expect(head).toEqual(expect.arrayContaining(['ring 1 km', 'ring 3 km', 'ring 5 km']));
      expect(rows).toHaveLength(3);
      rows.forEach((r, k) => {
        const c = run.results!.candidates[k];
        expect(Number(r[0])).toBe(c.rank);
        expect(Number(r[5])).toBeCloseTo(c.captured, 3);
        expect(Number(r[7])).toBeCloseTo(c.netNew, 3);
      });
      expect(rows.map((r) => r[1])).toContain("'=Saltmarsh Lane");
    });

    it('the sites GeoJSON holds every site of the run with kind, and scores for candidates', async () => {
      const res = await executive.get(`${runPath()}/sites.geojson`).expect(200);
      expect(res.headers['content-type']).toMatch(/^application\/geo\+json/);
      const fc = JSON.parse(res.text);
      expect(fc.type).toBe('FeatureCollection');
      expect(fc.features).toHaveLength(6);
      const kinds = fc.features
        .map((f: { properties: { kind: string } }) => f.properties.kind)
        .sort();
      expect(kinds).toEqual(['candidate', 'candidate', 'candidate', 'competitor', 'own', 'own']);
      const best = fc.features.find(
        (f: { properties: { rank?: number } }) => f.properties.rank === 1,
      );
      expect(best.properties.netNew).toBe(run.results!.candidates[0].netNew);
      const site = run.sites.find((s) => s.siteId === best.id)!;
      expect(best.geometry.coordinates).toEqual([
        Number(site.lon.toFixed(6)),
        Number(site.lat.toFixed(6)),
      ]);
    });

    it('the shortlist XLSX shows the asked version with positions, notes and the caution', async () => {
      const s = (
        await planner
          .post(`${w.base}/shortlists`, {
            name: 'Board pick',
            scoringRunId: w.runId,
            items: [{ siteId: w.siteIds['Lantern Hill'], note: 'Lease offer in hand' }],
          })
          .expect(201)
      ).body.shortlist;
      await planner
        .post(`${w.base}/shortlists/${s.id}/versions`, {
          scoringRunId: w.runId,
          items: [{ siteId: w.siteIds['Quay corner'] }, { siteId: w.siteIds['Lantern Hill'] }],
        })
        .expect(201);
      const res = await executive
        .get(`${w.base}/shortlists/${s.id}/export.xlsx?version=1`)
        .buffer(true)
        .parse(binary)
        .expect(200);
      expect(res.headers['content-disposition']).toBe(
        'attachment; filename="demandscape-north-corridor-2027-board-pick-v1.xlsx"',
      );
      const wb = await workbookOf(res.body as Buffer);
      expect(wb.worksheets.map((x) => x.name)).toEqual(['Summary', '1 Lantern Hill']);
      const summary = wb.getWorksheet('Summary')!;
      let caution: unknown;
      summary.eachRow((row) => {
        if (row.getCell(1).value === 'Caution') caution = row.getCell(2).value;
      });
      expect(caution).toBe(SHORTLIST_CAUTION);
      const latest = await executive
        .get(`${w.base}/shortlists/${s.id}/export.xlsx`)
        .buffer(true)
        .parse(binary)
        .expect(200);
      expect((await workbookOf(latest.body as Buffer)).worksheets.map((x) => x.name)).toEqual([
        'Summary',
        '1 Quay corner',
        '2 Lantern Hill',
      ]);
    });

    it('records each download in the audit log', async () => {
      const events = (
        await planner.get(`/api/organizations/${orgId}/audit-events?limit=100`).expect(200)
      ).body.events;
      const actions = events.map((e: { action: string }) => e.action);
      expect(actions).toEqual(
        expect.arrayContaining([
          'export.ranking_xlsx',
          'export.ranking_csv',
          'export.sites_geojson',
          'export.shortlist_xlsx',
        ]),
      );
      const csv = events.find((e: { action: string }) => e.action === 'export.ranking_csv');
      expect(csv.target).toEqual({ type: 'scoring_run', id: w.runId });
    });

    it('answers 409 RUN_NOT_READY for a run that has not finished, and 404 for an unknown run', async () => {
      await ds.scoringRunner.stop();
      const queued = (
        await planner.post(`${w.base}/scoring-runs`, { surfaceId: w.surfaceId }).expect(202)
      ).body.run;
      for (const file of ['export.xlsx', 'ranking.csv', 'sites.geojson']) {
        const res = await executive.get(`${w.base}/scoring-runs/${queued.id}/${file}`).expect(409);
        expect(res.body.error.code).toBe('RUN_NOT_READY');
      }
      await executive.get(`${w.base}/scoring-runs/no-such-run/ranking.csv`).expect(404);
    });
  },
);

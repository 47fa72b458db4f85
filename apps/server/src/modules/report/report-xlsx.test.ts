import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { SHORTLIST_CAUTION } from '../shortlist/shortlist-caution.js';
import type { ShortlistJson } from '../shortlist/shortlist.types.js';
import { reportRunFixture } from './report-fixture.js';
import { reportFromRun, reportFromShortlist } from './report-model.js';
import { reportWorkbook } from './report-xlsx.js';

async function readBack(bytes: Buffer): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  return wb;
}

function rowOf(sheet: ExcelJS.Worksheet, label: string): ExcelJS.Row {
  let found: ExcelJS.Row | undefined;
  sheet.eachRow((row) => {
    if (!found && row.getCell(1).value === label) found = row;
  });
  if (!found) throw new Error(`no row "${label}" in ${sheet.name}`);
  return found;
}

// Written with exceljs and read back with exceljs (a separate parse of the OOXML package) [CP].
describe('reportWorkbook (ranking)', () => {
  const run = reportRunFixture();

  it('has a Summary sheet and one sheet per candidate with sanitised names', async () => {
    const wb = await readBack(
      await reportWorkbook(reportFromRun(run, 'North corridor'), new Date('2026-12-02T03:00:00Z')),
    );
    expect(wb.worksheets.map((s) => s.name)).toEqual([
      'Summary',
      '1 Quay "corner", east',
      '2 Mill Lane',
      '3 =HYPERLINK("x")',
    ]);
  });

  it('summary: parameters, caution, ranked table with formats, widths, frozen header and autofilter', async () => {
    const wb = await readBack(
      await reportWorkbook(reportFromRun(run, 'North corridor'), new Date()),
    );
    const sheet = wb.getWorksheet('Summary')!;
    expect(rowOf(sheet, 'Workspace').getCell(2).value).toBe('North corridor');
    expect(rowOf(sheet, 'Kernel and bandwidth').getCell(2).value).toBe(
      'quartic, bandwidth 1,200 m, cells 100 m (EPSG:32624)',
    );
    expect(rowOf(sheet, 'Huff model β (distance decay)').getCell(2).value).toBe(2);
    expect(rowOf(sheet, 'Ring radii').getCell(2).value).toBe('1 km, 3 km');
    const total = rowOf(sheet, 'Total demand (customers)').getCell(2);
    expect(total.value).toBe(40_000);
    expect(total.numFmt).toBe('#,##0');
    expect(rowOf(sheet, 'Caution').getCell(2).value).toBe(SHORTLIST_CAUTION);

    const header = rowOf(sheet, 'Site');
    // Header right under title, context and caution, so the frozen rows stay few.
    expect(header.number).toBe(5);
    expect(header.values).toContain('Value: net new demand');
    expect(header.values).toContain('Within 3 km');
    const first = sheet.getRow(header.number + 1);
    expect(first.getCell(1).value).toBe('Quay "corner", east');
    expect(first.getCell(2).value).toBe(1);
    expect(first.getCell(4).value).toBe(12_400.25);
    expect(first.getCell(4).numFmt).toBe('#,##0');
    expect(first.getCell(7).value).toBeCloseTo(12_400.25 / 40_000, 12);
    expect(first.getCell(7).numFmt).toBe('0.0%');
    expect(first.getCell(10).value).toBe('1–2');
    expect(sheet.getColumn(1).width).toBe(34);
    expect(sheet.getColumn(4).width).toBe(14);
    expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: header.number, xSplit: 1 });
    expect(sheet.autoFilter).toBeTruthy();
  });

  it('site sheet: every score part with formats, per own store rows, rings, explanation and run parameters', async () => {
    const wb = await readBack(
      await reportWorkbook(reportFromRun(run, 'North corridor'), new Date()),
    );
    const sheet = wb.getWorksheet('2 Mill Lane')!;
    expect(sheet.getCell('A1').value).toBe('Mill Lane');
    expect(rowOf(sheet, 'Captured demand').getCell(2).value).toBe(8_000);
    expect(rowOf(sheet, 'Cannibalization').getCell(2).value).toBe(3_000);
    expect(rowOf(sheet, 'Net new demand').getCell(2).value).toBe(5_000);
    const share = rowOf(sheet, 'Share of total demand').getCell(2);
    expect(share.value).toBe(0.2);
    expect(share.numFmt).toBe('0.0%');
    const ferry = rowOf(sheet, 'Ferry Steps').getCell(2);
    expect(ferry.value).toBe(2_500);
    expect(ferry.numFmt).toBe('#,##0');
    expect(rowOf(sheet, 'Within 1 km').getCell(2).value).toBe(2_100);
    expect(rowOf(sheet, 'Rank range across bandwidths').getCell(2).value).toBe('1–2');
    expect(rowOf(sheet, 'Why it ranks here').number).toBeGreaterThan(0);
    const explanation = sheet.getRow(rowOf(sheet, 'Why it ranks here').number + 1).getCell(1).value;
    expect(explanation).toBe(run.results!.candidates[1].explanation);
    expect(rowOf(sheet, 'Huff model α (attractiveness exponent)').getCell(2).value).toBe(1);
    expect(sheet.getColumn(1).width).toBe(34);
    expect(sheet.getColumn(3).width).toBe(60);
  });
});

describe('reportWorkbook (long ranking)', () => {
  it('writes site sheets for the first 50 candidates only and says so above the full table', async () => {
    const model = reportFromRun(reportRunFixture(), 'North corridor');
    const [first] = model.sites;
    model.sites = Array.from({ length: 60 }, (_, k) => ({
      ...first,
      siteId: `c${k}`,
      name: `Candidate ${k + 1}`,
      score: { ...first.score, rank: k + 1 },
    }));
    const wb = await readBack(await reportWorkbook(model, new Date()));
    expect(wb.worksheets).toHaveLength(1 + 50);
    expect(wb.worksheets[50].name).toBe('50 Candidate 50');
    const summary = wb.getWorksheet('Summary')!;
    expect(summary.getCell('A4').value).toBe(
      'Site sheets for the first 50 of 60 candidates; this table lists all.',
    );
    expect(summary.getRow(rowOf(summary, 'Site').number + 60).getCell(1).value).toBe(
      'Candidate 60',
    );
  });
});

describe('reportWorkbook (shortlist)', () => {
  it('lists the items in the planner’s order with position, note and version', async () => {
    const run = reportRunFixture();
    const ranking = reportFromRun(run, 'North corridor');
    const mill = ranking.sites[1];
    const quay = ranking.sites[0];
    const shortlist = {
      id: 'sl-1',
      workspaceId: 'ws-1',
      workspaceName: 'North corridor',
      name: 'Board pick',
      latestVersion: 2,
      itemCount: 2,
      sharedAt: null,
      createdAt: '2026-12-02T03:00:00.000Z',
      updatedAt: '2026-12-02T03:00:00.000Z',
      createdBy: null,
      versions: [],
      sharedWith: [],
      caution: SHORTLIST_CAUTION,
      version: {
        version: 2,
        createdAt: '2026-12-02T03:00:00.000Z',
        createdBy: { id: 'u-p', name: 'Pia Planner' },
        versionNote: 'Mill first',
        scoringRunId: run.id,
        scoringRunName: run.name,
        surfaceId: run.surfaceId,
        surfaceName: run.surfaceName,
        settings: run.settings,
        weightLabel: run.weightLabel,
        totalDemand: 40_000,
        candidateCount: 3,
        items: [mill, quay].map((s, k) => ({
          order: k + 1,
          siteId: s.siteId,
          name: s.name,
          lon: s.lon,
          lat: s.lat,
          attractiveness: s.attractiveness,
          attractivenessLabel: s.attractivenessLabel,
          note: k === 0 ? 'Lease offer in hand' : '',
          score: s.score,
          stability: s.stability,
        })),
        ownStores: [],
        competitors: [],
      },
    } satisfies ShortlistJson;
    const wb = await readBack(await reportWorkbook(reportFromShortlist(shortlist), new Date()));
    expect(wb.worksheets.map((s) => s.name)).toEqual([
      'Summary',
      '1 Mill Lane',
      '2 Quay "corner", east',
    ]);
    const summary = wb.getWorksheet('Summary')!;
    expect(summary.getCell('A1').value).toBe('Demandscape shortlist: Board pick');
    expect(rowOf(summary, 'Version').getCell(2).value).toBe(
      '2 of 2026-12-02 by Pia Planner — Mill first',
    );
    const header = rowOf(summary, 'Site');
    expect(header.getCell(2).value).toBe('Position');
    expect(summary.getRow(header.number + 1).getCell(3).value).toBe(2);
    const site = wb.getWorksheet('1 Mill Lane')!;
    expect(rowOf(site, 'Position in the shortlist').getCell(2).value).toBe(1);
    expect(site.getRow(rowOf(site, "Planner's note").number + 1).getCell(1).value).toBe(
      'Lease offer in hand',
    );
  });
});

import type ExcelJS from 'exceljs';
import { measureLabel, ringLabel } from './report-labels.js';
import type { ReportModel } from './report-model.js';
import {
  DEGREE_FORMAT,
  DEMAND_FORMAT,
  REPORT_SITE_SHEETS_MAX,
  SHARE_FORMAT,
  reportParameterRows,
} from './report-parameters.js';

interface Column {
  header: string;
  width: number;
  numFmt?: string;
  value: (site: ReportModel['sites'][number]) => string | number | null;
}

function summaryColumns(model: ReportModel): Column[] {
  const s = model.settings;
  const valueFormat = s.measure === 'shareOfTotal' ? SHARE_FORMAT : DEMAND_FORMAT;
  const ringCount = model.sites[0]?.score.rings.length ?? s.radiiM.length;
  const rings: Column[] = Array.from({ length: ringCount }, (_, k) => ({
    header: `Within ${ringLabel(s, k, model.sites[0]?.score.rings[k]?.radiusM ?? s.radiiM[k])}`,
    width: 14,
    numFmt: DEMAND_FORMAT,
    value: (site) => site.score.rings[k]?.demand ?? null,
  }));
  return [
    { header: 'Site', width: 34, value: (site) => site.name },
    ...(model.kind === 'shortlist'
      ? [
          {
            header: 'Position',
            width: 10,
            value: (site: ReportModel['sites'][number]) => site.position,
          },
        ]
      : []),
    { header: 'Rank', width: 8, value: (site) => site.score.rank },
    {
      header: `Value: ${measureLabel(s.measure, s)}`,
      width: 18,
      numFmt: valueFormat,
      value: (site) => site.score.value,
    },
    { header: 'Captured', width: 14, numFmt: DEMAND_FORMAT, value: (site) => site.score.captured },
    {
      header: 'Cannibalization',
      width: 16,
      numFmt: DEMAND_FORMAT,
      value: (site) => site.score.cannibalization,
    },
    { header: 'Net new', width: 14, numFmt: DEMAND_FORMAT, value: (site) => site.score.netNew },
    {
      header: 'Share of total',
      width: 14,
      numFmt: SHARE_FORMAT,
      value: (site) => site.score.shareOfTotal,
    },
    ...rings,
    {
      header: 'Rank range',
      width: 12,
      value: (site) =>
        site.stability ? `${site.stability.minRank}–${site.stability.maxRank}` : null,
    },
    {
      header: 'Rank moves a lot',
      width: 16,
      value: (site) => (site.stability ? (site.stability.unstable ? 'yes' : 'no') : null),
    },
    { header: 'Longitude', width: 13, numFmt: DEGREE_FORMAT, value: (site) => site.lon },
    { header: 'Latitude', width: 13, numFmt: DEGREE_FORMAT, value: (site) => site.lat },
    {
      header: model.kind === 'shortlist' ? "Planner's note" : 'Site notes',
      width: 48,
      value: (site) => site.note || null,
    },
  ];
}

/**
 * Fills the "Summary" sheet: title, a one-line context (workspace, run, surface, measure, unit), the
 * caution, the ranked table (one row per site in report order) with a frozen header row and site
 * column, an autofilter, number formats (#,##0 demand, 0.0% share, 6-decimal degrees) and column
 * widths, then the run parameters.
 * @param sheet - an empty worksheet
 * @param model - the report model
 * @returns the table's header row number (1-based)
 * @example
 * const headerRow = reportSummaryFill(workbook.addWorksheet('Summary'), model);
 */
export function reportSummaryFill(sheet: ExcelJS.Worksheet, model: ReportModel): number {
  const columns = summaryColumns(model);
  columns.forEach((c, k) => (sheet.getColumn(k + 1).width = c.width));
  const title = sheet.addRow([
    model.kind === 'shortlist'
      ? `Demandscape shortlist: ${model.title}`
      : `Demandscape ranking: ${model.title}`,
  ]);
  title.font = { bold: true, size: 14 };
  const s = model.settings;
  sheet.addRow([
    `${model.workspaceName} · run "${model.runName}" on "${model.surfaceName}" · ranked by ${measureLabel(s.measure, s)} · demand in ${model.weightLabel}`,
  ]);
  const caution = sheet.addRow(['Caution', model.caution]);
  caution.getCell(1).font = { bold: true };
  sheet.mergeCells(caution.number, 2, caution.number, Math.min(columns.length, 8));
  caution.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  caution.height = 32;
  const n = model.sites.length;
  sheet.addRow(
    n > REPORT_SITE_SHEETS_MAX
      ? [
          `Site sheets for the first ${REPORT_SITE_SHEETS_MAX} of ${n.toLocaleString('en-US')} candidates; this table lists all.`,
        ]
      : [],
  );

  // The table comes before the parameters so that its frozen header stays near the top of the screen.
  const header = sheet.addRow(columns.map((c) => c.header));
  header.font = { bold: true };
  header.alignment = { wrapText: true, vertical: 'bottom' };
  header.eachCell((cell) => (cell.border = { bottom: { style: 'thin' } }));
  for (const site of model.sites) {
    const row = sheet.addRow(columns.map((c) => c.value(site)));
    columns.forEach((c, k) => c.numFmt && (row.getCell(k + 1).numFmt = c.numFmt));
  }

  sheet.addRow([]);
  sheet.addRow(['Run parameters']).font = { bold: true, size: 12 };
  for (const p of reportParameterRows(model)) {
    const row = sheet.addRow([p.label, p.value]);
    row.getCell(1).font = { bold: true };
    row.getCell(2).alignment = { horizontal: 'left' };
    if (p.numFmt) row.getCell(2).numFmt = p.numFmt;
  }
  sheet.views = [
    {
      state: 'frozen',
      xSplit: 1,
      ySplit: header.number,
      topLeftCell: `B${header.number + 1}`,
      activeCell: 'A1',
    },
  ];
  sheet.autoFilter = {
    from: { row: header.number, column: 1 },
    to: { row: header.number + model.sites.length, column: columns.length },
  };
  return header.number;
}

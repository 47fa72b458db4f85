import type ExcelJS from 'exceljs';
import { measureLabel, ringLabel } from './report-labels.js';
import type { ReportModel, ReportSite } from './report-model.js';
import {
  DEGREE_FORMAT,
  DEMAND_FORMAT,
  SHARE_FORMAT,
  reportParameterRows,
} from './report-parameters.js';

function section(sheet: ExcelJS.Worksheet, title: string): void {
  sheet.addRow([]);
  const row = sheet.addRow([title]);
  row.font = { bold: true, size: 12 };
}

function line(
  sheet: ExcelJS.Worksheet,
  label: string,
  value: string | number | null,
  numFmt?: string,
  detail?: string,
): ExcelJS.Row {
  const row = sheet.addRow([label, value, detail ?? null]);
  if (numFmt) row.getCell(2).numFmt = numFmt;
  row.getCell(2).alignment = { horizontal: typeof value === 'number' ? 'right' : 'left' };
  return row;
}

function paragraph(sheet: ExcelJS.Worksheet, text: string): void {
  const row = sheet.addRow([text]);
  sheet.mergeCells(row.number, 1, row.number, 3);
  row.getCell(1).alignment = { wrapText: true, vertical: 'top' };
  // About 110 characters per line across the three merged columns; 15 points per line.
  row.height = Math.max(15, Math.ceil(text.length / 110) * 15);
}

/**
 * Fills one site's sheet with every score part and the run parameters: position and rank, the
 * measure's value, captured demand, cannibalization (total and one row per own store), net new
 * demand, share of total, demand inside each ring, the rank range across bandwidths (when computed),
 * the explanation, the planner's note, the site's location and attractiveness, then the run
 * parameters and the caution. Columns: label (34), value (16, #,##0 / 0.0% formats), detail (60).
 * @param sheet - an empty worksheet
 * @param model - the report model
 * @param site - the site to describe
 * @returns nothing
 * @example
 * reportSiteFill(workbook.addWorksheet('1 Quay corner'), model, model.sites[0]);
 */
export function reportSiteFill(
  sheet: ExcelJS.Worksheet,
  model: ReportModel,
  site: ReportSite,
): void {
  const s = model.settings;
  const unit = model.weightLabel;
  sheet.getColumn(1).width = 34;
  sheet.getColumn(2).width = 16;
  sheet.getColumn(3).width = 60;
  const title = sheet.addRow([site.name]);
  title.font = { bold: true, size: 14 };
  sheet.addRow([
    `${model.kind === 'shortlist' ? `Shortlist "${model.title}"` : `Ranking of run "${model.runName}"`} — ${model.workspaceName}`,
  ]);

  section(sheet, 'Score');
  if (site.position !== null) line(sheet, 'Position in the shortlist', site.position);
  line(
    sheet,
    'Rank',
    site.score.rank,
    undefined,
    `of ${model.candidateCount} candidates by ${measureLabel(s.measure, s)}`,
  );
  line(
    sheet,
    'Value of the ranking measure',
    site.score.value,
    s.measure === 'shareOfTotal' ? SHARE_FORMAT : DEMAND_FORMAT,
    measureLabel(s.measure, s),
  );
  line(
    sheet,
    'Captured demand',
    site.score.captured,
    DEMAND_FORMAT,
    `${unit} the site would draw (Huff model)`,
  );
  line(
    sheet,
    'Cannibalization',
    site.score.cannibalization,
    DEMAND_FORMAT,
    `${unit} of that taken from own stores`,
  );
  line(
    sheet,
    'Net new demand',
    site.score.netNew,
    DEMAND_FORMAT,
    `${unit} new to the chain (captured − cannibalization)`,
  );
  line(
    sheet,
    'Share of total demand',
    site.score.shareOfTotal,
    SHARE_FORMAT,
    `of ${model.totalDemand.toLocaleString('en-US', { maximumFractionDigits: 0 })} ${unit} on the surface`,
  );
  if (site.stability) {
    const { minRank, maxRank, unstable } = site.stability;
    line(
      sheet,
      'Rank range across bandwidths',
      `${minRank}–${maxRank}`,
      undefined,
      unstable
        ? 'the rank moves a lot when the bandwidth changes; treat it with care'
        : 'rescored at 0.5×, 0.75×, 1.5× and 2× the bandwidth',
    );
  } else {
    line(
      sheet,
      'Rank range across bandwidths',
      'not computed',
      undefined,
      'run the rank stability check on the scoring run',
    );
  }

  section(sheet, 'Taken from own stores');
  if (site.score.cannibalizedFrom.length === 0) line(sheet, 'none', null);
  for (const store of site.score.cannibalizedFrom)
    line(sheet, store.name, store.demand, DEMAND_FORMAT, unit);

  section(sheet, 'Ring trade areas (demand inside each radius)');
  site.score.rings.forEach((r, k) =>
    line(sheet, `Within ${ringLabel(s, k, r.radiusM)}`, r.demand, DEMAND_FORMAT, unit),
  );

  section(sheet, 'Why it ranks here');
  paragraph(sheet, site.score.explanation || '–');
  section(sheet, model.kind === 'shortlist' ? "Planner's note" : 'Site notes');
  paragraph(sheet, site.note || '–');

  section(sheet, 'Site');
  line(sheet, 'Longitude', site.lon, DEGREE_FORMAT, 'WGS84 degrees');
  line(sheet, 'Latitude', site.lat, DEGREE_FORMAT, 'WGS84 degrees');
  line(sheet, 'Attractiveness', site.attractiveness, undefined, site.attractivenessLabel);

  section(sheet, 'Run parameters');
  for (const p of reportParameterRows(model)) line(sheet, p.label, p.value, p.numFmt);
  section(sheet, 'Caution');
  paragraph(sheet, model.caution);
  sheet.views = [{ state: 'normal', activeCell: 'A1' }];
}

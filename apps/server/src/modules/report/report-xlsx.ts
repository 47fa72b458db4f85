import ExcelJS from 'exceljs';
import type { ReportModel } from './report-model.js';
import { REPORT_SITE_SHEETS_MAX } from './report-parameters.js';
import { sheetNameUnique } from './sheet-name.js';
import { reportSiteFill } from './report-xlsx-site.js';
import { reportSummaryFill } from './report-xlsx-summary.js';

/**
 * The XLSX report of a ranking or a shortlist version: a "Summary" sheet (parameters, caution,
 * ranked table with frozen header and autofilter) and one sheet per site — the first 50
 * (REPORT_SITE_SHEETS_MAX) of a longer ranking — named "<position or rank> <site name>" (sanitised
 * and unique, see sheetNameUnique). Sites and aggregates only.
 * @param model - from reportFromRun or reportFromShortlist
 * @param createdAt - the workbook's creation time (document properties)
 * @returns the .xlsx file bytes
 * @example
 * const bytes = await reportWorkbook(reportFromShortlist(shortlist), new Date());
 */
export async function reportWorkbook(model: ReportModel, createdAt: Date): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Demandscape';
  workbook.created = createdAt;
  workbook.title =
    model.kind === 'shortlist' ? `Shortlist ${model.title}` : `Ranking ${model.title}`;
  const used = new Set<string>();
  reportSummaryFill(workbook.addWorksheet(sheetNameUnique('Summary', used)), model);
  for (const site of model.sites.slice(0, REPORT_SITE_SHEETS_MAX)) {
    const name = sheetNameUnique(`${site.position ?? site.score.rank} ${site.name}`, used);
    reportSiteFill(workbook.addWorksheet(name), model, site);
  }
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

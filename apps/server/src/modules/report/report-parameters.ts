import { measureLabel, numberText, ringLabel } from './report-labels.js';
import type { ReportModel } from './report-model.js';

/** Cell number format for demand (whole units with thousands separators). */
export const DEMAND_FORMAT = '#,##0';
/** Cell number format for shares of total demand (fractions shown as percent). */
export const SHARE_FORMAT = '0.0%';
/** Cell number format for WGS84 degrees (6 decimals, about 0.1 m). */
export const DEGREE_FORMAT = '0.000000';

/**
 * Most per-site sheets in one workbook: a shortlist has at most 50 sites; a ranking of more
 * candidates gets sheets for its first 50 (the summary table lists all). Each sheet costs tens of
 * milliseconds to write, so 1,000 sheets would hold a request for many seconds.
 */
export const REPORT_SITE_SHEETS_MAX = 50;

/** One "label: value" line of the run parameters. */
export interface ParameterRow {
  label: string;
  value: string | number;
  numFmt?: string;
}

/**
 * The run parameters every report repeats (summary sheet and each site sheet): workspace, shortlist
 * version, run, surface, kernel and bandwidth, Huff α and β, minimum distance, ring radii, measure,
 * unit and total of demand, counts of sites.
 * @param model - the report model
 * @returns rows in display order
 * @example
 * for (const row of reportParameterRows(model)) sheet.addRow([row.label, row.value]);
 */
export function reportParameterRows(model: ReportModel): ParameterRow[] {
  const s = model.settings;
  const rows: ParameterRow[] = [{ label: 'Workspace', value: model.workspaceName }];
  if (model.version) {
    const v = model.version;
    rows.push({ label: 'Shortlist', value: model.title });
    rows.push({
      label: 'Version',
      value: `${v.version} of ${v.createdAt.slice(0, 10)}${v.createdBy ? ` by ${v.createdBy}` : ''}${v.versionNote ? ` — ${v.versionNote}` : ''}`,
    });
  }
  rows.push({ label: 'Scoring run', value: model.runName });
  rows.push({ label: 'Demand surface', value: model.surfaceName });
  if (model.surface) {
    const f = model.surface;
    rows.push({
      label: 'Kernel and bandwidth',
      value: `${f.kernel}, bandwidth ${numberText(f.bandwidthM)} m, cells ${numberText(f.cellSizeM)} m (${f.projection})`,
    });
  }
  rows.push({ label: 'Huff model α (attractiveness exponent)', value: s.alpha });
  rows.push({ label: 'Huff model β (distance decay)', value: s.beta });
  rows.push({
    label: 'Smallest store–demand distance',
    value: s.minDistanceM === null ? 'half a grid cell' : `${numberText(s.minDistanceM)} m`,
  });
  rows.push({ label: 'Ring radii', value: s.radiiM.map((r, k) => ringLabel(s, k, r)).join(', ') });
  rows.push({ label: 'Ranked by', value: measureLabel(s.measure, s) });
  rows.push({ label: 'Unit of demand', value: model.weightLabel });
  rows.push({
    label: `Total demand (${model.weightLabel})`,
    value: model.totalDemand,
    numFmt: DEMAND_FORMAT,
  });
  rows.push({ label: 'Candidates scored', value: model.candidateCount });
  rows.push({
    label: 'Own stores / competitors',
    value: `${model.ownStores.length} / ${model.competitors.length}`,
  });
  return rows;
}

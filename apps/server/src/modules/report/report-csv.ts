import { measureLabel, ringLabel } from './report-labels.js';
import type { ReportModel } from './report-model.js';

/**
 * One CSV field (RFC 4180): text that a spreadsheet would run as a formula (starting with = + - @,
 * tab or carriage return) gets a leading apostrophe (OWASP "CSV injection" advice); fields with a
 * comma, quote or line break are quoted with inner quotes doubled. Numbers are written as numbers
 * (a negative longitude stays a number) and non-finite ones as an empty field.
 * @param value - text or number
 * @returns the field as it goes into the file
 * @example
 * csvField('=1+1'); // "'=1+1"
 * csvField('Quay "corner", east'); // '"Quay ""corner"", east"'
 */
export function csvField(value: string | number | null): string {
  if (value === null) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const round = (x: number, digits: number) => (Number.isFinite(x) ? Number(x.toFixed(digits)) : x);

/**
 * The ranking as CSV (RFC 4180: comma, CRLF, header row; UTF-8 with a byte-order mark so
 * spreadsheets read accents): rank, name, lon, lat (6 decimals), value of the ranking measure,
 * captured, cannibalization, net new, share of total (fraction); the value header names the measure, demand inside each ring (header
 * names the radius and unit), rank range across bandwidths when computed, site id. Demand has 3
 * decimals. Sites only — never customer points.
 * @param model - from reportFromRun (or reportFromShortlist)
 * @returns the file text
 * @example
 * res.send(reportRankingCsv(reportFromRun(run, workspaceName)));
 */
export function reportRankingCsv(model: ReportModel): string {
  const rings =
    model.sites[0]?.score.rings ?? model.settings.radiiM.map((radiusM) => ({ radiusM, demand: 0 }));
  const header = [
    ...(model.kind === 'shortlist' ? ['position'] : []),
    'rank',
    'name',
    'lon',
    'lat',
    `value (${measureLabel(model.settings.measure, model.settings)})`,
    'captured',
    'cannibalization',
    'net new',
    'share',
    ...rings.map((r, k) => `ring ${ringLabel(model.settings, k, r.radiusM)}`),
    'min rank',
    'max rank',
    'site id',
  ];
  const rows = model.sites.map((s) => [
    ...(model.kind === 'shortlist' ? [s.position] : []),
    s.score.rank,
    s.name,
    round(s.lon, 6),
    round(s.lat, 6),
    round(s.score.value, model.settings.measure === 'shareOfTotal' ? 6 : 3),
    round(s.score.captured, 3),
    round(s.score.cannibalization, 3),
    round(s.score.netNew, 3),
    round(s.score.shareOfTotal, 6),
    ...s.score.rings.map((r) => round(r.demand, 3)),
    s.stability?.minRank ?? null,
    s.stability?.maxRank ?? null,
    s.siteId,
  ]);
  return (
    '\uFEFF' + [header, ...rows].map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n'
  );
}

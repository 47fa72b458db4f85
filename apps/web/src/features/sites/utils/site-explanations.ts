import type { SiteKind } from '../types';

/** One plain sentence per site parameter, shown beside its control (PRODUCT.md "Look and feel"). */
export const siteExplanations = {
  kind: 'Candidate: a place you might open. Own store: one of yours today. Competitor: another chain’s store. All three compete for the same customers when scoring.',
  name: 'How the site appears on the map, in rankings and in shortlists.',
  attractiveness:
    'What draws customers — e.g. sales floor m² or a 1–10 score; all sites of a study must use the same measure. A larger value pulls customers from further away.',
  attractivenessLabel: 'The unit of that measure, e.g. “m² sales floor”; shown beside the number.',
  lon: 'East–west position in decimal degrees (WGS84, −180 to 180). With “Add on map” on, a click on the map fills it.',
  lat: 'North–south position in decimal degrees (WGS84, −90 to 90). Filled together with the longitude by a map click.',
  notes: 'Anything the team should know, e.g. lease terms, access or the broker. Shown in the inspector.',
  defaultKind: 'Used for every row when the file has no kind column.',
  defaultAttractiveness: 'Used for every row when the file has no attractiveness column; use the study’s one measure.',
} as const;

/** Words for each kind: singular, plural (list headings) and what the kind is for. */
export const siteKindWords: Record<SiteKind, { one: string; many: string }> = {
  candidate: { one: 'Candidate site', many: 'Candidate sites' },
  own: { one: 'Own store', many: 'Own stores' },
  competitor: { one: 'Competitor store', many: 'Competitor stores' },
};

/** Kinds in list order. */
export const siteKindOrder: readonly SiteKind[] = ['candidate', 'own', 'competitor'];

/**
 * A site's attractiveness with its unit, e.g. "180 m² sales floor".
 * @param value the attractiveness
 * @param label its unit (may be empty)
 * @returns the text, tabular-figure friendly
 * @example attractivenessText(180, 'm² sales floor') // '180 m² sales floor'
 */
export function attractivenessText(value: number, label: string): string {
  const number = value.toLocaleString('en', { maximumFractionDigits: 2 });
  return label.trim() ? `${number} ${label.trim()}` : number;
}

/**
 * Degrees for a form field: six decimals (about 0.1 m), no trailing zeros.
 * @param degrees a longitude or latitude
 * @returns the text
 * @example degreesText(-38.5123456789) // '-38.512346'
 */
export function degreesText(degrees: number): string {
  return String(Number(degrees.toFixed(6)));
}

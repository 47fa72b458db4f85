import { columnFor, columnGuess, headerWords } from '../customer-file/column-guess.js';

/** Fields of a site that a file's columns can fill. */
export const SITE_MAPPING_FIELDS = ['name', 'lon', 'lat', 'kind', 'attractiveness', 'attractivenessLabel', 'notes'] as const;
export type SiteMappingField = (typeof SITE_MAPPING_FIELDS)[number];

/** Which column (by its header name) fills each site field; null = no column. */
export type SiteColumnMapping = Record<SiteMappingField, string | null>;

/** Fields every imported site needs; `kind` and `attractiveness` may come from a default instead. */
export const SITE_REQUIRED_FIELDS = ['name', 'lon', 'lat', 'kind', 'attractiveness'] as const;

/** Column order assumed for a file without a header line. */
export const SITE_HEADERLESS_ORDER = ['name', 'kind', 'lon', 'lat', 'attractiveness', 'notes'] as const;

// Header words (lower case, accents removed), most preferred first.
const KIND_WORDS = ['kind', 'type', 'category', 'class', 'status', 'role'];
const ATTRACTIVENESS_WORDS = ['attractiveness', 'attraction', 'floor', 'area', 'size', 'sqm', 'm2', 'sqft', 'score', 'rating', 'capacity', 'seats'];
const LABEL_WORDS = ['unit', 'units', 'label', 'measure'];
const NOTES_WORDS = ['notes', 'note', 'comment', 'comments', 'remark', 'remarks', 'description', 'memo', 'details'];
const NAME_WORDS = ['name', 'site', 'store', 'shop', 'branch', 'outlet', 'location', 'title', 'place', 'id'];

/**
 * Suggests which columns hold each site field from the header names alone: longitude and latitude
 * as for customer files (`columnGuess`), then kind, attractiveness (floor area, size, score …),
 * its unit label, notes and the name. Each column serves one field at most.
 * @param columns - header names
 * @returns the mapping (null where nothing fits)
 * @example
 * siteColumnGuess(['Site name', 'Longitude', 'Latitude', 'Floor area (m²)', 'Comment']);
 * // { name: 'Site name', lon: 'Longitude', lat: 'Latitude', kind: null, attractiveness: 'Floor area (m²)', attractivenessLabel: null, notes: 'Comment' }
 */
export function siteColumnGuess(columns: string[]): SiteColumnMapping {
  const { lon, lat } = columnGuess(columns);
  const taken = new Set([lon, lat].filter((c): c is string => c !== undefined));
  const pick = (words: string[]): string | null => {
    const c = columnFor(columns, words, [], taken);
    if (c === undefined) return null;
    taken.add(c);
    return c;
  };
  const kind = pick(KIND_WORDS);
  const attractiveness = pick(ATTRACTIVENESS_WORDS);
  const attractivenessLabel = pick(LABEL_WORDS);
  const notes = pick(NOTES_WORDS);
  const name = pick(NAME_WORDS);
  return { name, lon: lon ?? null, lat: lat ?? null, kind, attractiveness, attractivenessLabel, notes };
}

/**
 * The mapping of a file without a header line: columns in the order name, kind, lon, lat,
 * attractiveness, notes (as many as the file has).
 * @param columns - the generated names ("column 1" …)
 * @returns the mapping
 * @example
 * siteMappingByOrder(['column 1', 'column 2', 'column 3', 'column 4', 'column 5']).lat; // 'column 4'
 */
export function siteMappingByOrder(columns: string[]): SiteColumnMapping {
  const mapping = Object.fromEntries(SITE_MAPPING_FIELDS.map((f) => [f, null])) as SiteColumnMapping;
  SITE_HEADERLESS_ORDER.forEach((field, i) => {
    if (i < columns.length) mapping[field] = columns[i];
  });
  return mapping;
}

/**
 * True when a first row reads as a header: it names at least two site fields, or it has no number
 * while the next row has one.
 * @param first - the first row's cells
 * @param second - the second row's cells (undefined for a one-row file)
 * @param isNumber - whether a cell is a number
 * @returns whether the first row is a header
 * @example
 * siteHeaderIs(['name', 'lon', 'lat'], ['Quay', '-38.5', '44.5'], (t) => !isNaN(Number(t))); // true
 */
export function siteHeaderIs(first: string[], second: string[] | undefined, isNumber: (text: string) => boolean): boolean {
  const named = Object.values(siteColumnGuess(first.map((c) => c.trim()))).filter((c) => c !== null).length;
  if (named >= 2) return true;
  const numbers = (row: string[]) => row.filter((c) => c.trim() !== '' && isNumber(c)).length;
  return numbers(first) === 0 && second !== undefined && numbers(second) > 0 && first.some((c) => headerWords(c).length > 0);
}

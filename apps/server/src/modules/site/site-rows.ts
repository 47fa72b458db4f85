import type { SiteKind } from '@demandscape/core';
import { ValidationError } from '../common/errors.js';
import { cellNumber } from '../customer-file/cell-number.js';
import { SITE_MAPPING_FIELDS, type SiteColumnMapping, type SiteMappingField } from './site-columns.js';
import type { SiteFileTable } from './site-file-read.js';
import { siteKindMessage, siteKindParse } from './site-kind.js';
import { siteCreateSchema, type SiteCreateInput } from './site.schemas.js';

/** How to turn a file's rows into sites. */
export interface SiteImportOptions {
  mapping: SiteColumnMapping;
  /** Kind of every site when no column holds the kind (and of rows whose kind cell is empty). */
  defaultKind?: SiteKind;
  /** Attractiveness of every site when no column holds it (and of rows whose cell is empty). */
  defaultAttractiveness?: number;
}

/** One problem in one row; `row` counts the non-blank rows of the file from 1 (a header is row 1). */
export interface SiteRowError {
  row: number;
  field: string;
  message: string;
}

const LABEL_MAX = 60;

/**
 * Checks a mapping against the file's columns: every mapped column exists and serves one field;
 * name, lon and lat are mapped; kind and attractiveness are mapped or have a default.
 * @param table - the file
 * @param options - mapping and defaults
 * @returns nothing
 * @throws ValidationError naming `mapping.<field>` (every problem in `fields`)
 * @example
 * siteMappingCheck(table, { mapping, defaultKind: 'candidate' });
 */
export function siteMappingCheck(table: SiteFileTable, options: SiteImportOptions): void {
  const { mapping } = options;
  const fields: Record<string, string> = {};
  const listed = table.columns.map((c) => `"${c}"`).join(', ');
  const usedBy = new Map<string, SiteMappingField>();
  for (const field of SITE_MAPPING_FIELDS) {
    const column = mapping[field];
    if (column === null) continue;
    if (!table.columns.includes(column)) fields[`mapping.${field}`] = `column "${column}" is not in the file; its columns are ${listed}`;
    else if (usedBy.has(column)) fields[`mapping.${field}`] = `column "${column}" is already mapped to ${usedBy.get(column)}; each column fills one field`;
    else usedBy.set(column, field);
  }
  const what: Record<'name' | 'lon' | 'lat', string> = { name: 'the site name', lon: 'the longitude (WGS84 degrees)', lat: 'the latitude (WGS84 degrees)' };
  for (const field of ['name', 'lon', 'lat'] as const) {
    if (mapping[field] === null) fields[`mapping.${field}`] ??= `choose the column that holds ${what[field]}; the file's columns are ${listed}`;
  }
  if (mapping.kind === null && options.defaultKind === undefined) {
    fields['mapping.kind'] ??= 'choose the column that holds the kind (candidate, own or competitor), or send defaultKind for every site of the file';
  }
  if (mapping.attractiveness === null && options.defaultAttractiveness === undefined) {
    fields['mapping.attractiveness'] ??= 'choose the column that holds the attractiveness (e.g. sales floor m² or a 1–10 score), or send defaultAttractiveness for every site of the file';
  }
  const [first] = Object.keys(fields);
  if (first) throw new ValidationError(`${first}: ${fields[first]}`, first, fields);
}

/**
 * Turns every data row into a site with the create route's rules, collecting every problem of
 * every row (import only when `errors` is empty). Rows whose mapped cells are all empty are
 * skipped and counted. The attractiveness unit label comes from its mapped column, else from the
 * attractiveness column's header (e.g. "Floor area (m²)").
 * @param table - the file (mapping already checked with `siteMappingCheck`)
 * @param options - mapping and defaults
 * @returns the sites, the row errors and how many empty rows were skipped
 * @example
 * const { sites, errors, emptyRows } = siteRowsParse(table, { mapping, defaultKind: 'candidate' });
 */
export function siteRowsParse(table: SiteFileTable, options: SiteImportOptions): { sites: SiteCreateInput[]; errors: SiteRowError[]; emptyRows: number } {
  const { mapping } = options;
  const index = Object.fromEntries(SITE_MAPPING_FIELDS.map((f) => [f, mapping[f] === null ? -1 : table.columns.indexOf(mapping[f]!)])) as Record<SiteMappingField, number>;
  const mapped = SITE_MAPPING_FIELDS.filter((f) => index[f] >= 0);
  const headerLabel = table.hasHeader && mapping.attractiveness !== null && mapping.attractiveness.length <= LABEL_MAX ? mapping.attractiveness : '';
  const sites: SiteCreateInput[] = [];
  const errors: SiteRowError[] = [];
  let emptyRows = 0;
  table.rows.forEach((cells, i) => {
    const row = table.firstRow + i;
    const text = (f: SiteMappingField) => (index[f] >= 0 ? (cells[index[f]] ?? '').trim() : '');
    if (mapped.every((f) => text(f) === '')) {
      emptyRows++;
      return;
    }
    const rowErrors: Record<string, string> = {};
    const number = (f: 'lon' | 'lat' | 'attractiveness', what: string, fallback?: number): number | undefined => {
      const t = text(f);
      const v = cellNumber(t, table.decimalComma);
      if (v === null) {
        if (fallback !== undefined) return fallback;
        rowErrors[f] = `is empty; write ${what}`;
      } else if (Number.isNaN(v)) rowErrors[f] = `must be a number (${what}), got "${t}"; write the number only, without units or thousands separators`;
      else return v;
      return undefined;
    };
    let kind: SiteKind | undefined = options.defaultKind;
    if (index.kind >= 0 && text('kind') !== '') {
      kind = siteKindParse(text('kind')) ?? undefined;
      if (!kind) rowErrors.kind = siteKindMessage(text('kind'));
    } else if (!kind) rowErrors.kind = 'is empty; write candidate, own or competitor (or choose a default kind for rows without one)';
    const raw = {
      name: text('name'),
      kind,
      lon: number('lon', 'longitude in degrees, e.g. -38.51'),
      lat: number('lat', 'latitude in degrees, e.g. 44.52'),
      attractiveness: index.attractiveness >= 0 ? number('attractiveness', 'e.g. sales floor m² or a 1–10 score', options.defaultAttractiveness) : options.defaultAttractiveness,
      attractivenessLabel: index.attractivenessLabel >= 0 ? text('attractivenessLabel') : headerLabel,
      notes: text('notes'),
    };
    if (raw.name === '') rowErrors.name = 'is empty; every site needs a name';
    const result = siteCreateSchema.safeParse(raw);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = issue.path.join('.') || 'row';
        rowErrors[field] ??= issue.message;
      }
    }
    if (rowErrors.lat && raw.lat !== undefined && Math.abs(raw.lat) > 90 && raw.lon !== undefined && Math.abs(raw.lon) <= 90) {
      rowErrors.lat += ' — are longitude and latitude swapped? Check which column holds which';
    }
    const fields = Object.keys(rowErrors);
    if (fields.length === 0 && result.success) sites.push(result.data);
    else for (const field of fields) errors.push({ row, field, message: rowErrors[field] });
  });
  return { sites: errors.length === 0 ? sites : [], errors, emptyRows };
}

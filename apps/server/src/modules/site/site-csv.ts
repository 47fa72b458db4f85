import Papa from 'papaparse';
import { siteCreateSchema, type SiteCreateInput } from './site.schemas.js';

/** Most data rows one sites CSV may hold. */
export const SITE_CSV_MAX_ROWS = 5000;

/** Columns in the order assumed when the first row is not a header. */
export const SITE_CSV_COLUMNS = ['name', 'kind', 'lon', 'lat', 'attractiveness', 'notes'] as const;
type Column = (typeof SITE_CSV_COLUMNS)[number];

const ALIASES: Record<string, Column> = {
  name: 'name',
  site: 'name',
  kind: 'kind',
  type: 'kind',
  lon: 'lon',
  lng: 'lon',
  long: 'lon',
  longitude: 'lon',
  lat: 'lat',
  latitude: 'lat',
  attractiveness: 'attractiveness',
  notes: 'notes',
  note: 'notes',
};

/** One problem in one row; `row` counts the non-empty rows of the file from 1 (a header is row 1). */
export interface SiteRowError {
  row: number;
  field: string;
  message: string;
}

function headerMap(cells: string[]): Map<Column, number> | null {
  const map = new Map<Column, number>();
  cells.forEach((c, i) => {
    const col = ALIASES[c.trim().toLowerCase().replace(/[\s_-]+/g, '')];
    if (col && !map.has(col)) map.set(col, i);
  });
  // A header names at least two known columns; a data row never does.
  return map.size >= 2 ? map : null;
}

function cellNumber(text: string | undefined): unknown {
  const t = (text ?? '').trim();
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : t;
}

/**
 * Reads a small sites CSV (comma, semicolon or tab; UTF-8) and checks every row with the same
 * rules as the create route. The first row is a header when it names at least two of name, kind,
 * lon, lat, attractiveness, notes (aliases: longitude, lng, latitude, type, note); otherwise the
 * columns are taken in that order.
 * @param buffer - the file's bytes
 * @returns the valid rows and every row error (import only when `errors` is empty)
 * @example
 * const { sites, errors } = siteCsvRead(Buffer.from('name,kind,lon,lat,attractiveness\nQuay,candidate,-38.5,44.5,120'));
 */
export function siteCsvRead(buffer: Buffer): { sites: SiteCreateInput[]; errors: SiteRowError[] } {
  const text = buffer.toString('utf8').replace(/^\uFEFF/, '');
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t'] });
  const lines = parsed.data;
  const errors: SiteRowError[] = [];
  if (lines.length === 0) return { sites: [], errors: [{ row: 1, field: 'file', message: 'the file has no rows; send a CSV with one site per row' }] };
  const header = headerMap(lines[0]);
  const columns = header ?? new Map(SITE_CSV_COLUMNS.map((c, i) => [c, i] as const));
  if (header) {
    for (const c of SITE_CSV_COLUMNS.filter((c) => c !== 'notes')) {
      if (!header.has(c)) errors.push({ row: 1, field: c, message: `the header has no "${c}" column; expected columns ${SITE_CSV_COLUMNS.join(', ')}` });
    }
    if (errors.length > 0) return { sites: [], errors };
  }
  const first = header ? 1 : 0;
  const count = lines.length - first;
  if (count === 0) return { sites: [], errors: [{ row: 1, field: 'file', message: 'the file has a header but no sites' }] };
  if (count > SITE_CSV_MAX_ROWS) {
    return { sites: [], errors: [{ row: first + SITE_CSV_MAX_ROWS + 1, field: 'file', message: `the file has ${count} sites; import at most ${SITE_CSV_MAX_ROWS} per file` }] };
  }
  const sites: SiteCreateInput[] = [];
  for (let i = first; i < lines.length; i++) {
    const cells = lines[i];
    const cell = (c: Column) => (columns.has(c) ? cells[columns.get(c)!] : undefined);
    const raw = {
      name: cell('name') ?? '',
      kind: (cell('kind') ?? '').trim().toLowerCase(),
      lon: cellNumber(cell('lon')),
      lat: cellNumber(cell('lat')),
      attractiveness: cellNumber(cell('attractiveness')),
      notes: cell('notes') ?? '',
    };
    const result = siteCreateSchema.safeParse(raw);
    if (result.success) {
      sites.push(result.data);
      continue;
    }
    const seen = new Set<string>();
    for (const issue of result.error.issues) {
      const field = issue.path.join('.') || 'row';
      if (seen.has(field)) continue;
      seen.add(field);
      errors.push({ row: i + 1, field, message: issue.message });
    }
  }
  return { sites: errors.length === 0 ? sites : [], errors };
}

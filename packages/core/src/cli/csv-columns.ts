import { CoreError } from '../errors.js';

/** Which columns of a customer CSV hold the coordinates and the weight. */
export interface CsvColumns {
  /** Column index of longitude (or planar x, metres). */
  a: number;
  /** Column index of latitude (or planar y, metres). */
  b: number;
  /** Column index of the weight, or -1 for weight 1 per row. */
  w: number;
  /** Header names as found, for messages. */
  names: { a: string; b: string; w?: string };
}

/** Options naming columns explicitly; names match case-insensitively after trimming. */
export interface CsvColumnOptions {
  planar: boolean;
  a?: string;
  b?: string;
  weight?: string;
}

const LON_NAMES = ['lon', 'lng', 'long', 'longitude', 'x'];
const LAT_NAMES = ['lat', 'latitude', 'y'];
const X_NAMES = ['x', 'easting', 'east'];
const Y_NAMES = ['y', 'northing', 'north'];

function normalise(name: string): string {
  return name.trim().toLowerCase();
}

function columnFind(header: string[], wanted: string, flag: string): number {
  const k = header.findIndex((h) => normalise(h) === normalise(wanted));
  if (k < 0) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `column "${wanted}" given by ${flag} is not in the header (columns: ${header.join(', ')})`,
      flag,
    );
  }
  return k;
}

function columnGuess(header: string[], candidates: string[], what: string, flag: string): number {
  // Earlier candidates win: "lon" beats a stray "x" column.
  for (const c of candidates) {
    const k = header.findIndex((h) => normalise(h) === c);
    if (k >= 0) return k;
  }
  throw new CoreError(
    'INVALID_ARGUMENT',
    `no ${what} column found (looked for ${candidates.join(', ')}; columns: ${header.join(', ')}); name it with ${flag}`,
    flag,
  );
}

/**
 * Finds the coordinate and weight columns in a CSV header: explicit names first, else common
 * names (lon/lng/long/longitude/x and lat/latitude/y; for planar input x/easting and y/northing).
 *
 * @param header the first CSV row
 * @param options explicit column names and whether coordinates are planar metres
 * @returns column indices and names
 * @example
 * csvColumns(['id', 'Latitude', 'Longitude', 'spend'], { planar: false, weight: 'spend' });
 * // { a: 2, b: 1, w: 3, names: { a: 'Longitude', b: 'Latitude', w: 'spend' } }
 */
export function csvColumns(header: string[], options: CsvColumnOptions): CsvColumns {
  const [aFlag, bFlag] = options.planar ? ['--x', '--y'] : ['--lon', '--lat'];
  const a = options.a
    ? columnFind(header, options.a, aFlag)
    : columnGuess(header, options.planar ? X_NAMES : LON_NAMES, options.planar ? 'x (metres)' : 'longitude', aFlag);
  const b = options.b
    ? columnFind(header, options.b, bFlag)
    : columnGuess(header, options.planar ? Y_NAMES : LAT_NAMES, options.planar ? 'y (metres)' : 'latitude', bFlag);
  if (a === b) {
    throw new CoreError('INVALID_ARGUMENT', `${aFlag} and ${bFlag} both point at column "${header[a]}"`, aFlag);
  }
  const w = options.weight ? columnFind(header, options.weight, '--weight') : -1;
  if (w === a || w === b) {
    throw new CoreError('INVALID_ARGUMENT', `--weight column "${header[w]}" is also a coordinate column`, '--weight');
  }
  return { a, b, w, names: { a: header[a].trim(), b: header[b].trim(), w: w >= 0 ? header[w].trim() : undefined } };
}

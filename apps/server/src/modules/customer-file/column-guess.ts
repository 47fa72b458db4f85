import type { ColumnMapping } from './customer-file.entity.js';

// Header words (lower case, accents removed) in English, German, French, Spanish, Italian, Dutch.
const LAT_WORDS = [
  'lat',
  'latitude',
  'breite',
  'breitengrad',
  'latitud',
  'latitudine',
  'breedte',
  'breedtegraad',
  'ycoord',
  'geolat',
  'wgs84lat',
];
const LON_WORDS = [
  'lon',
  'lng',
  'long',
  'longitude',
  'lange',
  'laenge',
  'langengrad',
  'laengengrad',
  'longitud',
  'longitudine',
  'lengte',
  'lengtegraad',
  'xcoord',
  'geolon',
  'wgs84lon',
];
// In order of preference: money first, then visits, then generic counts and weights.
const WEIGHT_WORDS = [
  'spend',
  'sales',
  'revenue',
  'umsatz',
  'ventas',
  'montant',
  'amount',
  'betrag',
  'importe',
  'turnover',
  'omzet',
  'visits',
  'besuche',
  'visites',
  'visitas',
  'bezoeken',
  'orders',
  'bestellungen',
  'count',
  'anzahl',
  'nombre',
  'cantidad',
  'aantal',
  'weight',
  'gewicht',
  'poids',
  'peso',
  'value',
  'wert',
];

/**
 * Lower-cases a header and removes accents, so "Länge" and "LAENGE" compare as words.
 * @param header - header text
 * @returns the words of the header (split on anything that is not a letter or digit)
 * @example
 * headerWords('Kunden-Länge (WGS84)'); // ['kunden', 'lange', 'wgs84']
 */
export function headerWords(header: string): string[] {
  return header
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter((w) => w !== '');
}

/**
 * The first column (not yet taken) whose header is one of `words` (in the order of `words`), else
 * whose header contains one of them as a word, else whose whole header spells one of `exactOnly`.
 * Shared with the sites import (`modules/site/site-columns.ts`).
 * @param columns - header names
 * @param words - header words, most preferred first
 * @param exactOnly - words accepted only as the whole header (e.g. `x`, `y`)
 * @param taken - columns already given to another field
 * @returns the column, or undefined when none fits
 * @example
 * columnFor(['Site name', 'Lat'], ['name'], [], new Set()); // 'Site name'
 */
export function columnFor(
  columns: string[],
  words: string[],
  exactOnly: string[],
  taken: Set<string>,
): string | undefined {
  for (const word of words) {
    for (const c of columns) {
      if (taken.has(c)) continue;
      const ws = headerWords(c);
      if (ws.length === 1 && ws[0] === word) return c;
    }
  }
  for (const word of words) {
    for (const c of columns) if (!taken.has(c) && headerWords(c).includes(word)) return c;
  }
  for (const word of exactOnly)
    for (const c of columns) if (!taken.has(c) && headerWords(c).join('') === word) return c;
  return undefined;
}

/**
 * Suggests which columns hold longitude, latitude and the weight from the header names alone
 * (several languages; `x`/`y` only as whole names). The analyst confirms or changes the suggestion.
 * @param columns - header names
 * @returns the suggested mapping (fields left out when nothing fits)
 * @example
 * columnGuess(['Kunde', 'Breite', 'Länge', 'Umsatz']); // { lat: 'Breite', lon: 'Länge', weight: 'Umsatz' }
 */
export function columnGuess(columns: string[]): Partial<ColumnMapping> {
  const taken = new Set<string>();
  const lat = columnFor(columns, LAT_WORDS, ['y', 'pointy'], taken);
  if (lat) taken.add(lat);
  const lon = columnFor(columns, LON_WORDS, ['x', 'pointx'], taken);
  if (lon) taken.add(lon);
  const weight = columnFor(columns, WEIGHT_WORDS, [], taken);
  return { ...(lon ? { lon } : {}), ...(lat ? { lat } : {}), ...(weight ? { weight } : {}) };
}

import { CoreError } from '../errors.js';
import type { GridSpec } from '../types.js';

/** Options for {@link geotiffFromGrid}. */
export interface GeotiffOptions {
  /** EPSG code of the projected CRS (e.g. 32626 for UTM 26N). Omit for a user-defined metric plane. */
  epsg?: number;
  /** Value written for NaN cells and declared in the GDAL_NODATA tag. Default: no nodata tag, NaN kept. */
  noData?: number;
  /** Short description stored in the GTCitationGeoKey (ASCII). */
  citation?: string;
}

// TIFF 6.0 field types.
const SHORT = 3;
const LONG = 4;
const DOUBLE = 12;
const ASCII = 2;

// GeoTIFF 1.1 (OGC 19-008r4) tag and key ids.
const TAG_MODEL_PIXEL_SCALE = 33550;
const TAG_MODEL_TIEPOINT = 33922;
const TAG_GEO_KEY_DIRECTORY = 34735;
const TAG_GEO_ASCII_PARAMS = 34737;
const TAG_GDAL_NODATA = 42113;
const KEY_GT_MODEL_TYPE = 1024;
const KEY_GT_RASTER_TYPE = 1025;
const KEY_GT_CITATION = 1026;
const KEY_PROJECTED_CS_TYPE = 3072;
const KEY_PROJ_LINEAR_UNITS = 3076;
const MODEL_TYPE_PROJECTED = 1;
const RASTER_PIXEL_IS_AREA = 1;
const USER_DEFINED = 32767;
const LINEAR_UNIT_METRE = 9001;

interface Entry {
  tag: number;
  type: number;
  values: number[] | string;
}

function entryByteLength(e: Entry): number {
  if (e.type === ASCII) return (e.values as string).length + 1;
  const size = e.type === SHORT ? 2 : e.type === LONG ? 4 : 8;
  return size * (e.values as number[]).length;
}

function asciiOnly(s: string, field: string): string {
  if (!/^[\x20-\x7e]*$/.test(s)) {
    throw new CoreError('INVALID_ARGUMENT', `${field} must be printable ASCII for a GeoTIFF (got "${s}")`, field);
  }
  return s;
}

/**
 * Encodes a grid as a single-band float32 GeoTIFF (little-endian, one uncompressed strip).
 * Rows are written north-up: the grid's j = 0 (southern) row becomes the LAST image row.
 * ModelTiepoint maps pixel corner (0, 0) to the grid's north-west corner; pixels are areas.
 *
 * @param values row-major grid values (index i + j·width, j = 0 south), e.g. intensity per km²
 * @param spec the grid (planar metres)
 * @param options EPSG code, nodata value, citation
 * @returns the file bytes
 * @example
 * const bytes = geotiffFromGrid(surface.intensity, spec, { epsg: 32626 });
 */
export function geotiffFromGrid(
  values: ArrayLike<number>,
  spec: GridSpec,
  options: GeotiffOptions = {},
): ArrayBuffer {
  const { width, height, cellSize, originX, originY } = spec;
  if (!(Number.isInteger(width) && width > 0 && Number.isInteger(height) && height > 0)) {
    throw new CoreError('INVALID_ARGUMENT', `grid width and height must be positive integers (got ${width}×${height})`, 'spec');
  }
  if (values.length !== width * height) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `values must hold width × height = ${width * height} cells (got ${values.length})`,
      'values',
    );
  }
  if (!(cellSize > 0) || !Number.isFinite(originX) || !Number.isFinite(originY)) {
    throw new CoreError('INVALID_ARGUMENT', 'grid origin must be finite and cell size positive', 'spec');
  }
  const { epsg, noData } = options;
  if (epsg !== undefined && !(Number.isInteger(epsg) && epsg > 1024 && epsg < 32767)) {
    throw new CoreError('INVALID_ARGUMENT', `epsg must be an integer EPSG code between 1025 and 32766 (got ${epsg})`, 'epsg');
  }
  const citation = asciiOnly(options.citation ?? 'Demandscape demand surface', 'citation');

  const geoKeys = [
    [KEY_GT_MODEL_TYPE, 0, 1, MODEL_TYPE_PROJECTED],
    [KEY_GT_RASTER_TYPE, 0, 1, RASTER_PIXEL_IS_AREA],
    [KEY_GT_CITATION, TAG_GEO_ASCII_PARAMS, citation.length + 1, 0],
    [KEY_PROJECTED_CS_TYPE, 0, 1, epsg ?? USER_DEFINED],
    [KEY_PROJ_LINEAR_UNITS, 0, 1, LINEAR_UNIT_METRE],
  ];
  const geoKeyDirectory = [1, 1, 0, geoKeys.length, ...geoKeys.flat()];
  const imageBytes = width * height * 4;

  // Entries sorted by tag, as TIFF requires; strip offset is patched in once the layout is known.
  const entries: Entry[] = [
    { tag: 256, type: LONG, values: [width] },
    { tag: 257, type: LONG, values: [height] },
    { tag: 258, type: SHORT, values: [32] },
    { tag: 259, type: SHORT, values: [1] },
    { tag: 262, type: SHORT, values: [1] },
    { tag: 273, type: LONG, values: [0] },
    { tag: 277, type: SHORT, values: [1] },
    { tag: 278, type: LONG, values: [height] },
    { tag: 279, type: LONG, values: [imageBytes] },
    { tag: 284, type: SHORT, values: [1] },
    { tag: 339, type: SHORT, values: [3] },
    { tag: TAG_MODEL_PIXEL_SCALE, type: DOUBLE, values: [cellSize, cellSize, 0] },
    { tag: TAG_MODEL_TIEPOINT, type: DOUBLE, values: [0, 0, 0, originX, originY + height * cellSize, 0] },
    { tag: TAG_GEO_KEY_DIRECTORY, type: SHORT, values: geoKeyDirectory },
    // GeoAsciiParams ends each key's string with '|' (GeoTIFF spec §2.4).
    { tag: TAG_GEO_ASCII_PARAMS, type: ASCII, values: `${citation}|` },
  ];
  if (noData !== undefined) entries.push({ tag: TAG_GDAL_NODATA, type: ASCII, values: String(noData) });

  const ifdOffset = 8;
  const ifdSize = 2 + entries.length * 12 + 4;
  let extraOffset = ifdOffset + ifdSize;
  const extraOffsets = entries.map((e) => {
    const len = entryByteLength(e);
    if (len <= 4) return -1;
    const at = extraOffset;
    extraOffset += len + (len & 1);
    return at;
  });
  const stripOffset = extraOffset + ((8 - (extraOffset % 8)) % 8);
  entries[5].values = [stripOffset];

  const buffer = new ArrayBuffer(stripOffset + imageBytes);
  const view = new DataView(buffer);
  view.setUint8(0, 0x49);
  view.setUint8(1, 0x49);
  view.setUint16(2, 42, true);
  view.setUint32(4, ifdOffset, true);
  view.setUint16(ifdOffset, entries.length, true);
  entries.forEach((e, k) => {
    const at = ifdOffset + 2 + k * 12;
    const count = e.type === ASCII ? (e.values as string).length + 1 : (e.values as number[]).length;
    view.setUint16(at, e.tag, true);
    view.setUint16(at + 2, e.type, true);
    view.setUint32(at + 4, count, true);
    const target = extraOffsets[k] >= 0 ? extraOffsets[k] : at + 8;
    if (extraOffsets[k] >= 0) view.setUint32(at + 8, extraOffsets[k], true);
    if (e.type === ASCII) {
      const s = e.values as string;
      for (let c = 0; c < s.length; c++) view.setUint8(target + c, s.charCodeAt(c));
      view.setUint8(target + s.length, 0);
    } else {
      (e.values as number[]).forEach((v, n) => {
        if (e.type === SHORT) view.setUint16(target + 2 * n, v, true);
        else if (e.type === LONG) view.setUint32(target + 4 * n, v, true);
        else view.setFloat64(target + 8 * n, v, true);
      });
    }
  });
  view.setUint32(ifdOffset + 2 + entries.length * 12, 0, true);

  // Little-endian host assumed by Float32Array (all supported Node platforms are little-endian).
  const pixels = new Float32Array(buffer, stripOffset, width * height);
  for (let row = 0; row < height; row++) {
    const j = height - 1 - row;
    for (let i = 0; i < width; i++) {
      const v = values[i + j * width];
      pixels[i + row * width] = Number.isNaN(v) && noData !== undefined ? noData : v;
    }
  }
  return buffer;
}

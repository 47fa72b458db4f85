import { CoreError } from '../errors.js';
import { KERNEL_NAMES, type Extent, type KernelName } from '../types.js';

/** Bandwidth rules the CLI accepts by name. */
export const BANDWIDTH_RULES = ['normal-reference', 'likelihood-cv', 'least-squares-cv'] as const;
export type CliBandwidthRule = (typeof BANDWIDTH_RULES)[number];

/** Output formats, chosen by file extension. */
export type OutputKind = 'csv' | 'geotiff' | 'geojson';

/** Raw option strings as commander hands them over. */
export interface DensityRawOptions {
  input: string;
  output?: string[];
  planar?: boolean;
  lon?: string;
  lat?: string;
  x?: string;
  y?: string;
  weight?: string;
  kernel: string;
  bandwidth: string;
  cellSize?: string;
  extent?: string;
  method: string;
  maxCells?: string;
  epsg?: string;
  projection?: string;
}

/** Checked options for the density command. */
export interface DensityOptions {
  input: string;
  outputs: Array<{ path: string; kind: OutputKind }>;
  planar: boolean;
  columns: { a?: string; b?: string; weight?: string };
  kernel: KernelName;
  bandwidth: number | CliBandwidthRule;
  cellSize?: number;
  /** In the input's units: degrees (lon/lat) or metres (planar). */
  extent?: Extent;
  method: 'exact' | 'binned' | 'auto';
  maxCells?: number;
  epsg?: number;
  projection: 'utm' | 'laea';
}

function bad(flag: string, message: string): CoreError {
  return new CoreError('INVALID_ARGUMENT', `${flag} ${message}`, flag);
}

function positiveNumber(flag: string, raw: string): number {
  const v = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(v) || v <= 0) throw bad(flag, `must be a positive number of metres (got "${raw}")`);
  return v;
}

/**
 * The output format from a file name: .csv, .tif/.tiff or .geojson/.json.
 *
 * @param path output file name
 * @returns the format
 * @example
 * outputKind('surface.tif'); // 'geotiff'
 */
export function outputKind(path: string): OutputKind {
  const ext = path.toLowerCase().match(/\.([a-z]+)$/)?.[1] ?? '';
  if (ext === 'csv') return 'csv';
  if (ext === 'tif' || ext === 'tiff') return 'geotiff';
  if (ext === 'geojson' || ext === 'json') return 'geojson';
  throw bad('--output', `"${path}" has no known extension: use .csv (x,y,density rows), .tif (GeoTIFF) or .geojson (contours)`);
}

/**
 * Parses "minx,miny,maxx,maxy" (four numbers, min < max).
 *
 * @param raw the flag's value
 * @param planar whether the numbers are metres (else lon/lat degrees, range-checked)
 * @returns the extent
 * @example
 * extentParse('-38.7,44.4,-38.3,44.6', false);
 */
export function extentParse(raw: string, planar: boolean): Extent {
  const parts = raw.split(',').map((s) => s.trim());
  const v = parts.map(Number);
  if (parts.length !== 4 || parts.some((s) => s === '') || !v.every(Number.isFinite)) {
    throw bad('--extent', `must be four numbers minx,miny,maxx,maxy (got "${raw}")`);
  }
  const [minX, minY, maxX, maxY] = v;
  if (!(minX < maxX && minY < maxY)) throw bad('--extent', `needs minx < maxx and miny < maxy (got "${raw}")`);
  if (!planar && (Math.abs(minX) > 180 || Math.abs(maxX) > 180 || Math.abs(minY) > 90 || Math.abs(maxY) > 90)) {
    throw bad('--extent', `is in degrees for lon/lat input: longitudes within ±180, latitudes within ±90 (got "${raw}")`);
  }
  return { minX, minY, maxX, maxY };
}

/**
 * Checks and converts the density command's raw options; every problem names its flag.
 *
 * @param raw option strings from the command line
 * @returns typed options
 * @throws CoreError INVALID_ARGUMENT
 * @example
 * densityOptions({ input: 'c.csv', output: ['s.tif'], kernel: 'quartic', bandwidth: '800', method: 'auto' });
 */
export function densityOptions(raw: DensityRawOptions): DensityOptions {
  const planar = raw.planar === true;
  const output = raw.output ?? [];
  if (output.length === 0) throw bad('--output', 'is required: give at least one .csv, .tif or .geojson file');
  if (planar && (raw.lon || raw.lat)) throw bad('--lon/--lat', 'cannot be used with --planar; name the metre columns with --x and --y');
  if (!planar && (raw.x || raw.y)) throw bad('--x/--y', 'need --planar (coordinates already in metres); for degrees use --lon and --lat');
  if (!planar && raw.epsg) throw bad('--epsg', 'applies to --planar input only; lon/lat input is projected to its UTM zone, whose code is written automatically');
  const projection = raw.projection ?? 'utm';
  if (projection !== 'utm' && projection !== 'laea') throw bad('--projection', `must be utm or laea (got "${projection}")`);
  if (planar && raw.projection) throw bad('--projection', 'applies to lon/lat input only; --planar coordinates are already projected');
  if (!(KERNEL_NAMES as readonly string[]).includes(raw.kernel)) throw bad('--kernel', `must be one of ${KERNEL_NAMES.join(', ')} (got "${raw.kernel}")`);
  let bandwidth: number | CliBandwidthRule;
  if ((BANDWIDTH_RULES as readonly string[]).includes(raw.bandwidth)) bandwidth = raw.bandwidth as CliBandwidthRule;
  else if (/^[\d.eE+-]+$/.test(raw.bandwidth.trim())) bandwidth = positiveNumber('--bandwidth', raw.bandwidth);
  else throw bad('--bandwidth', `must be metres or one of ${BANDWIDTH_RULES.join(', ')} (got "${raw.bandwidth}")`);
  if (!['exact', 'binned', 'auto'].includes(raw.method)) throw bad('--method', `must be exact, binned or auto (got "${raw.method}")`);
  let maxCells: number | undefined;
  if (raw.maxCells !== undefined) {
    maxCells = Number(raw.maxCells);
    if (!Number.isInteger(maxCells) || maxCells <= 0) throw bad('--max-cells', `must be a positive whole number (got "${raw.maxCells}")`);
  }
  let epsg: number | undefined;
  if (raw.epsg !== undefined) {
    epsg = Number(raw.epsg);
    if (!Number.isInteger(epsg) || epsg <= 1024 || epsg >= 32767) throw bad('--epsg', `must be an EPSG code between 1025 and 32766 (got "${raw.epsg}")`);
  }
  return {
    input: raw.input,
    outputs: output.map((path) => ({ path, kind: outputKind(path) })),
    planar,
    columns: { a: planar ? raw.x : raw.lon, b: planar ? raw.y : raw.lat, weight: raw.weight },
    kernel: raw.kernel as KernelName,
    bandwidth,
    cellSize: raw.cellSize === undefined ? undefined : positiveNumber('--cell-size', raw.cellSize),
    extent: raw.extent === undefined ? undefined : extentParse(raw.extent, planar),
    method: raw.method as DensityOptions['method'],
    maxCells,
    epsg,
    projection,
  };
}

import { readFileSync, writeFileSync } from 'node:fs';
import { CoreError } from '../errors.js';
import { formatNumber } from '../lib/format-number.js';
import { densityContours, type DensityContours } from '../pipeline/density-contours.js';
import { densityFromLonLat } from '../pipeline/density-from-lon-lat.js';
import { densityFromPlanar, type DensityPlanarResult } from '../pipeline/density-from-planar.js';
import { geotiffFromGrid } from '../raster/geotiff-encode.js';
import { progressReporter, type CliIo } from './cli-io.js';
import { csvPoints, csvProblemsFormat } from './csv-points.js';
import { densityCsvWrite, type CentreConvert } from './density-csv.js';
import type { DensityOptions, OutputKind } from './density-options.js';
import { densitySummary } from './density-summary.js';

/** Exit code for rejected input rows (nothing computed). */
export const EXIT_BAD_ROWS = 2;

/** A computed surface with what the writers need, whichever kind of input it came from. */
export interface CliSurface {
  result: DensityPlanarResult;
  contours: DensityContours;
  /** Planar metres → lon/lat; absent for planar input. */
  convert?: CentreConvert;
  epsg?: number;
  crs: string;
  /** proj4 string of a CRS with no EPSG code (LAEA), kept in the GeoTIFF citation. */
  proj4?: string;
}

/**
 * Writes one output file by kind.
 *
 * @param path output file
 * @param kind csv, geotiff or geojson
 * @param s the surface and its converters
 * @returns nothing
 * @example
 * surfaceWrite('out.tif', 'geotiff', surface);
 */
export function surfaceWrite(path: string, kind: OutputKind, s: CliSurface): void {
  const { grid, surface } = s.result;
  try {
    if (kind === 'csv') densityCsvWrite(path, surface.intensity, grid, s.convert);
    else if (kind === 'geotiff') {
      const citation = `Demandscape ${surface.stats.kernel} demand surface, weight per km2${s.proj4 ? `; CRS ${s.proj4}` : ''}`;
      writeFileSync(path, new Uint8Array(geotiffFromGrid(surface.intensity, grid, { epsg: s.epsg, citation })));
    } else writeFileSync(path, `${JSON.stringify(s.contours.geojson)}\n`);
  } catch (e) {
    if (e instanceof CoreError) throw e;
    throw new CoreError('INVALID_ARGUMENT', `cannot write --output ${path}: ${(e as Error).message}`, '--output');
  }
}

/** The engine names its option 'projection'; on the command line it is the --projection flag. */
function lonLatRun<T>(run: () => T): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof CoreError && e.code === 'PROJECTION_SPAN') {
      throw new CoreError(e.code, `${e.message} (on the command line: --projection laea)`, '--projection', e.details);
    }
    throw e;
  }
}

function inputRead(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message;
    throw new CoreError('INVALID_ARGUMENT', `cannot read --input ${path}: ${why}`, '--input');
  }
}

/**
 * Runs `demandscape density`: read and check the CSV (every bad row reported, exit 2), build the
 * surface, write every requested output, print the summary on stderr.
 *
 * @param opts checked options
 * @param io output streams and clock
 * @returns the exit code (0, or 2 for bad rows); other failures throw CoreError
 * @example
 * const code = densityCommand(densityOptions(raw), processIo);
 */
export function densityCommand(opts: DensityOptions, io: CliIo): number {
  const started = io.now();
  const csv = csvPoints(inputRead(opts.input), { planar: opts.planar, ...opts.columns });
  if (csv.problems.length > 0) {
    io.err(`${csvProblemsFormat(csv.problems, opts.input)}\n`);
    return EXIT_BAD_ROWS;
  }
  if (csv.a.length === 0) {
    throw new CoreError('EMPTY_POINTS', `${opts.input} has a header but no data rows`, '--input');
  }
  const progress = progressReporter(io, 'computing the demand surface');
  const common = {
    kernel: opts.kernel,
    bandwidth: opts.bandwidth,
    cellSize: opts.cellSize,
    method: opts.method,
    maxCells: opts.maxCells,
    onProgress: progress.update,
  };
  let s: CliSurface;
  if (opts.planar) {
    const result = densityFromPlanar({ x: csv.a, y: csv.b, w: csv.w }, { ...common, extent: opts.extent });
    s = {
      result,
      contours: densityContours(result.surface.intensity, result.grid),
      epsg: opts.epsg,
      crs: opts.epsg ? `planar metres (EPSG:${opts.epsg})` : 'planar metres (no EPSG code given)',
    };
  } else {
    const r = lonLatRun(() => densityFromLonLat(csv.a, csv.b, csv.w, { ...common, extent: opts.extent, projection: opts.projection }));
    s = {
      result: r,
      contours: r.contours,
      convert: (x, y) => {
        const { lon, lat } = r.converter.inverse(x, y);
        return { a: lon, b: lat };
      },
      epsg: r.projection.epsg ?? undefined,
      crs: r.projection.label,
      proj4: r.projection.epsg === null ? r.projection.proj4 : undefined,
    };
  }
  progress.done();
  for (const o of opts.outputs) surfaceWrite(o.path, o.kind, s);
  const { x, y } = s.result.surface.stats.maxCell;
  const peak = s.convert?.(Float64Array.of(x), Float64Array.of(y));
  const peakAt = peak ? `lon ${peak.a[0].toFixed(5)}, lat ${peak.b[0].toFixed(5)}` : `x ${formatNumber(x, 1)}, y ${formatNumber(y, 1)}`;
  io.err(
    densitySummary(s.result, {
      crs: s.crs,
      peakAt,
      contours: s.contours,
      seconds: (io.now() - started) / 1000,
      written: opts.outputs.map((o) => o.path),
    }),
  );
  return 0;
}

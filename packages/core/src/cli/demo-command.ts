import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { CoreError } from '../errors.js';
import { formatNumber } from '../lib/format-number.js';
import { densityFromLonLat } from '../pipeline/density-from-lon-lat.js';
import { progressReporter, type CliIo } from './cli-io.js';
import { surfaceWrite, type CliSurface } from './density-command.js';
import { demoCustomers, QUILLPORT_CENTRE } from './demo-customers.js';
import { densitySummary } from './density-summary.js';

/** Options of `demandscape demo`. */
export interface DemoOptions {
  /** Output folder (default ./demo-output). */
  out: string;
  /** Number of invented customers (default 30,000). */
  customers: number;
}

/**
 * Runs `demandscape demo`: invents the Larchloaf customers around Quillport (open sea, see
 * {@link QUILLPORT_CENTRE}), builds the surface with the defaults (quartic, normal-reference
 * bandwidth, suggested cell size) and writes a CSV, a GeoTIFF and the contours into `out`.
 *
 * @param opts output folder and customer count
 * @param io output streams and clock
 * @returns the exit code (0)
 * @example
 * demoCommand({ out: 'demo-output', customers: 30_000 }, processIo);
 */
export function demoCommand(opts: DemoOptions, io: CliIo): number {
  if (!(Number.isInteger(opts.customers) && opts.customers >= 10 && opts.customers <= 2_000_000)) {
    throw new CoreError('INVALID_ARGUMENT', `--customers must be a whole number from 10 to 2,000,000 (got ${opts.customers})`, '--customers');
  }
  const started = io.now();
  try {
    mkdirSync(opts.out, { recursive: true });
  } catch (e) {
    throw new CoreError('INVALID_ARGUMENT', `cannot create the output folder ${opts.out}: ${(e as Error).message}`, '--out');
  }
  io.err(
    `Larchloaf demo: ${formatNumber(opts.customers)} invented loyalty-card customers (annual spend as weight) around the fictional city of Quillport, placed in open sea at lon ${QUILLPORT_CENTRE.lon}, lat ${QUILLPORT_CENTRE.lat}.\n`,
  );
  const c = demoCustomers(opts.customers);
  const progress = progressReporter(io, 'computing the demand surface');
  const r = densityFromLonLat(c.lon, c.lat, c.w, { onProgress: progress.update });
  progress.done();
  const s: CliSurface = {
    result: r,
    contours: r.contours,
    convert: (x, y) => {
      const { lon, lat } = r.converter.inverse(x, y);
      return { a: lon, b: lat };
    },
    epsg: r.projection.epsg ?? undefined,
    crs: r.projection.label,
  };
  const files = [
    { path: join(opts.out, 'larchloaf-surface.csv'), kind: 'csv' as const },
    { path: join(opts.out, 'larchloaf-surface.tif'), kind: 'geotiff' as const },
    { path: join(opts.out, 'larchloaf-contours.geojson'), kind: 'geojson' as const },
  ];
  for (const f of files) surfaceWrite(f.path, f.kind, s);
  const { x, y } = r.surface.stats.maxCell;
  const [lon, lat] = r.converter.inversePoint(x, y);
  io.err(
    densitySummary(r, {
      crs: r.projection.label,
      peakAt: `lon ${lon.toFixed(5)}, lat ${lat.toFixed(5)}`,
      contours: r.contours,
      seconds: (io.now() - started) / 1000,
      written: files.map((f) => f.path),
    }),
  );
  return 0;
}

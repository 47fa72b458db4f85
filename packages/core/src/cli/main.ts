#!/usr/bin/env node
import { realpathSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Command, CommanderError } from 'commander';
import { isCoreError } from '../errors.js';
import { KERNEL_NAMES } from '../types.js';
import { processIo, type CliIo } from './cli-io.js';
import { densityCommand } from './density-command.js';
import { BANDWIDTH_RULES, densityOptions, type DensityRawOptions } from './density-options.js';
import { demoCommand } from './demo-command.js';

const BANDWIDTH_HELP = `
Bandwidth convention:
  --bandwidth is in metres and means the kernel's support RADIUS for the compact kernels
  (quartic, epanechnikov, triweight, uniform, triangular: nothing beyond it counts) and the
  STANDARD DEVIATION per axis for gaussian. The summary prints the other figure beside it:
  the kernel's own sd for compact kernels and the canonically equivalent Gaussian sd, or for
  gaussian the equivalent quartic radius (Marron & Nolan 1988 canonical scaling; a Gaussian
  sd of 1 km ≈ a quartic radius of 2.78 km).
  Rules: normal-reference (Silverman's rule, spread × n_eff^(−1/6); fast, suits one broad
  cluster), likelihood-cv and least-squares-cv (cross-validation; slower, follows several
  tight clusters).

Output (chosen by extension, --output may be repeated):
  .csv      x,y,density — one row per cell centre, in the input's units (lon/lat degrees, or
            metres with --planar), density = weighted points per km²
  .tif      GeoTIFF, float32, north-up, in the projected CRS (UTM zone EPSG code; laea and
            --planar without --epsg are user-defined planes, the laea proj4 string is kept
            in the citation)
  .geojson  percent-volume contours 50 %, 75 %, 90 % (lon/lat; metres with --planar), with
            properties percent and threshold (per km²)

Exit codes: 0 done; 1 bad option or input (the message says what to change); 2 bad rows in
the CSV (every bad row is reported, up to 20 listed, nothing is computed).
Customer locations are personal data: outputs hold surfaces and contours only, never points.
`;

function collect(value: string, previous: string[] | undefined): string[] {
  return [...(previous ?? []), value];
}

function program(io: CliIo, result: { code: number }): Command {
  const root = new Command('demandscape')
    .description('Demand surfaces (weighted kernel density) from geocoded customers, for retail site selection.')
    .exitOverride()
    .configureOutput({ writeOut: io.out, writeErr: io.err })
    .showHelpAfterError('(run with --help for every option)');
  root
    .command('density')
    .description('Build a demand surface from a customer CSV and write CSV / GeoTIFF / GeoJSON outputs.')
    .requiredOption('--input <file>', 'customer CSV with a header row')
    .option('--output <file>', 'output file: .csv, .tif or .geojson (repeat for several)', collect)
    .option('--lon <column>', 'longitude column (default: first of lon, lng, long, longitude, x)')
    .option('--lat <column>', 'latitude column (default: first of lat, latitude, y)')
    .option('--planar', 'coordinates are already planar metres: no projection')
    .option('--x <column>', 'with --planar: x column in metres (default: x, easting, east)')
    .option('--y <column>', 'with --planar: y column in metres (default: y, northing, north)')
    .option('--weight <column>', 'weight column, e.g. annual spend (default: every customer weighs 1)')
    .option('--kernel <name>', `kernel: ${KERNEL_NAMES.join(', ')}`, 'quartic')
    .option('--bandwidth <metres|rule>', `metres, or a rule: ${BANDWIDTH_RULES.join(', ')}`, 'normal-reference')
    .option('--cell-size <metres>', 'cell size in metres (default: suggested from the bandwidth)')
    .option('--extent <minx,miny,maxx,maxy>', "study extent in the input's units (degrees, or metres with --planar); default: the points plus the kernel's reach")
    .option('--method <name>', 'exact, binned or auto (auto picks by cost and accuracy)', 'auto')
    .option('--max-cells <n>', 'largest grid allowed (default 4,000,000 cells)')
    .option('--epsg <code>', 'with --planar: EPSG code of the metric CRS, written into the GeoTIFF')
    .option('--projection <name>', 'lon/lat input: utm (default: the UTM zone of the data) or laea (equal-area centred on the data, for regions wider than a UTM zone allows or near the poles)')
    .addHelpText('after', BANDWIDTH_HELP)
    .action((raw: DensityRawOptions) => {
      result.code = densityCommand(densityOptions(raw), io);
    });
  root
    .command('demo')
    .description('Invent the Larchloaf demo customers around Quillport (open sea), build the surface and write CSV, GeoTIFF and GeoJSON.')
    .option('--out <folder>', 'output folder', 'demo-output')
    .option('--customers <n>', 'number of invented customers', '30000')
    .action((raw: { out: string; customers: string }) => {
      result.code = demoCommand({ out: raw.out, customers: Number(raw.customers) }, io);
    });
  return root;
}

/**
 * Runs the CLI with user arguments (no node/script prefix) and returns the exit code instead of
 * exiting, so tests can call it in-process.
 *
 * @param argv e.g. ['density', '--input', 'c.csv', '--output', 's.tif']
 * @param io output streams and clock (default the process's)
 * @returns 0 on success, 1 for bad options or input, 2 for bad CSV rows
 * @example
 * process.exitCode = await main(process.argv.slice(2));
 */
export async function main(argv: string[], io: CliIo = processIo): Promise<number> {
  const result = { code: 0 };
  try {
    await program(io, result).parseAsync(argv, { from: 'user' });
    return result.code;
  } catch (e) {
    if (e instanceof CommanderError) return e.exitCode === 0 ? 0 : 1;
    if (isCoreError(e)) {
      io.err(`demandscape: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
}

function invokedDirectly(): boolean {
  try {
    return process.argv[1] !== undefined && realpathSync(process.argv[1]) === fileURLToPath(import.meta.url);
  } catch {
    return false;
  }
}

if (invokedDirectly()) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (e: unknown) => {
      process.stderr.write(`demandscape: unexpected failure: ${(e as Error).stack ?? String(e)}\n`);
      process.exitCode = 70;
    },
  );
}

import { randomUUID } from 'node:crypto';
import { mkdir, stat, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { demoCustomers } from '@demandscape/core';
import type { EntityManager, MikroORM } from '@mikro-orm/sqlite';
import { CustomerFileSchema } from '../modules/customer-file/customer-file.entity.js';
import { customerFileImport, customerFileImportStart } from '../modules/customer-file/customer-file-import.js';
import { customerFileCreate } from '../modules/customer-file/customer-file.service.js';
import type { User } from '../modules/user/user.entity.js';

/** Name of the invented demo customer file (the upload's original file name). */
export const DEMO_CUSTOMER_FILE_NAME = 'Larchloaf loyalty card holders (invented)';
/** Good invented customers in the demo file (before the deliberately bad rows). */
export const DEMO_CUSTOMER_COUNT = 30_000;
/** Seed of the demo customer generator: the same file on every machine. */
export const DEMO_CUSTOMER_SEED = 1604;

/**
 * Deliberately bad rows appended to the demo file so the validation report has something to show:
 * `[lon, lat, spend]` cell texts, each with the outcome the importer should give it.
 */
const DEMO_BAD_ROWS: { cells: [string, string, string]; outcome: string }[] = [
  { cells: ['', '44.503120', '152.40'], outcome: 'missing-coordinate' },
  { cells: ['-38.471200', '', '98.10'], outcome: 'missing-coordinate' },
  { cells: ['', '', '230.00'], outcome: 'missing-coordinate' },
  { cells: ['-38.522900', '', '61.75'], outcome: 'missing-coordinate' },
  { cells: ['n/a', '44.488100', '175.20'], outcome: 'non-numeric-coordinate' },
  { cells: ['-38.490300', 'unknown', '143.00'], outcome: 'non-numeric-coordinate' },
  { cells: ['-38.5 W', '44.5 N', '88.60'], outcome: 'non-numeric-coordinate' },
  { cells: ['see address', '44.512000', '204.35'], outcome: 'non-numeric-coordinate' },
  { cells: ['0', '0', '120.00'], outcome: 'null-island' },
  { cells: ['0.000000', '0.000000', '77.90'], outcome: 'null-island' },
  // A typo'd latitude beyond ±90° with a longitude that would fit as one: reported as swapped.
  { cells: ['-38.511400', '-124.500000', '131.10'], outcome: 'likely-swapped' },
  { cells: ['-218.500000', '44.497700', '95.00'], outcome: 'longitude-out-of-range' },
  { cells: ['-38.480600', '44.520300', '-45.00'], outcome: 'negative-weight' },
  { cells: ['-38.533800', '44.476500', '-12.50'], outcome: 'negative-weight' },
  { cells: ['-38.507700', '44.509900', '-180.00'], outcome: 'negative-weight' },
  { cells: ['-38.495100', '44.492200', 'twelve'], outcome: 'non-numeric-weight' },
  { cells: ['-38.516600', '44.503800', ''], outcome: 'non-numeric-weight' },
  // Latitude and longitude entered the wrong way round: inside the valid ranges, so accepted but far away.
  { cells: ['44.501300', '-38.492700', '166.40'], outcome: 'outlier' },
  { cells: ['44.487900', '-38.515000', '59.80'], outcome: 'outlier' },
  { cells: ['44.512600', '-38.478800', '212.90'], outcome: 'outlier' },
  // One far outlier: about 330 km north-east of Quillport, still open sea.
  { cells: ['-35.700000', '46.400000', '140.00'], outcome: 'outlier' },
];
/** Generated rows repeated word for word at the end of the file (flagged as duplicates). */
const DEMO_DUPLICATED_ROWS = [17, 4_242, 29_999] as const;

/**
 * The invented demo customer CSV: `customer_ref,lon,lat,spend` with seeded customers around
 * Quillport, then a few deliberately bad and duplicated rows.
 * @returns the CSV text (UTF-8, comma-delimited, point as the decimal mark)
 * @example
 * const csv = demoCustomerCsv(); // 30,024 data rows
 */
export function demoCustomerCsv(): string {
  const { lon, lat, w } = demoCustomers(DEMO_CUSTOMER_COUNT, DEMO_CUSTOMER_SEED);
  const rows: string[] = ['customer_ref,lon,lat,spend'];
  const row = (k: number) => `LL-${String(k + 1).padStart(6, '0')},${lon[k]!.toFixed(6)},${lat[k]!.toFixed(6)},${w[k]!.toFixed(2)}`;
  for (let k = 0; k < DEMO_CUSTOMER_COUNT; k++) rows.push(row(k));
  DEMO_BAD_ROWS.forEach((bad, i) => rows.push([`LL-X${String(i + 1).padStart(5, '0')}`, ...bad.cells].join(',')));
  for (const k of DEMO_DUPLICATED_ROWS) rows.push(row(k));
  return rows.join('\n') + '\n';
}

/**
 * Adds the demo customer file to the demo workspace when it has no customer file yet: writes the
 * CSV into the uploads folder and runs it through the same register → map → import steps as an
 * upload by the demo analyst (flagged rows left out), then waits for the import to finish.
 * @param em - entity manager (a fork)
 * @param orm - the ORM (the import forks its own entity manager)
 * @param uploadsDir - UPLOADS_DIR
 * @param scope - the demo organization and workspace
 * @param analyst - the demo analyst (uploader)
 * @returns the new file's id, or null when the workspace already had a customer file
 * @example
 * const fileId = await demoCustomerFileSeed(em, orm, config.uploadsDir, { organizationId, workspaceId }, analyst);
 */
export async function demoCustomerFileSeed(
  em: EntityManager,
  orm: MikroORM,
  uploadsDir: string,
  scope: { organizationId: string; workspaceId: string },
  analyst: User,
): Promise<string | null> {
  const existing = await em.count(CustomerFileSchema, { workspace: scope.workspaceId });
  if (existing > 0) return null;
  await mkdir(uploadsDir, { recursive: true, mode: 0o700 });
  const storedName = randomUUID();
  const path = join(uploadsDir, storedName);
  await writeFile(path, demoCustomerCsv(), { mode: 0o600 });
  const { size } = await stat(path);
  const { customerFile } = await customerFileCreate(em, scope, analyst, {
    path,
    storedName,
    originalName: DEMO_CUSTOMER_FILE_NAME,
    size,
  });
  await customerFileImportStart(em, scope, customerFile.id, analyst, {
    mapping: { lon: 'lon', lat: 'lat', weight: 'spend' },
    weightKind: 'spend',
    weightLabel: 'annual spend (€)',
    // The swapped rows lie thousands of km away: kept in the stored points they would stretch the
    // data extent of every surface, so the demo leaves flagged rows out (the report still lists them).
    excludeFlagged: true,
  });
  await customerFileImport(orm, customerFile.id, uploadsDir);
  return customerFile.id;
}

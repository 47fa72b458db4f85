/**
 * Writes the offline demo basemap for the invented city of Quillport into the web app's static files.
 * Run from the repository root: `npx tsx infra/basemap/generate-quillport-basemap.ts [output path]`.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { quillportBasemap } from './quillport-basemap.js';

const here = dirname(fileURLToPath(import.meta.url));
const output = resolve(process.argv[2] ?? resolve(here, '../../apps/web/public/basemap/quillport.geojson'));
const basemap = quillportBasemap();
mkdirSync(dirname(output), { recursive: true });
writeFileSync(output, `${JSON.stringify(basemap)}\n`);
process.stdout.write(`Wrote ${basemap.features.length} features to ${output}\n`);

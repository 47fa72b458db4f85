import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fromArrayBuffer } from 'geotiff';
import { afterAll, describe, expect, it } from 'vitest';
import type { CliIo } from '../src/cli/cli-io.js';
import { demoCustomers } from '../src/cli/demo-customers.js';
import { main } from '../src/cli/main.js';
import { REFERENCE_DIR, referenceExcess, referenceRead, type KdeReference } from './reference-data.js';

const dir = mkdtempSync(join(tmpdir(), 'ds-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function bufferIo(): CliIo & { stdout: string; stderr: string } {
  const io = {
    stdout: '',
    stderr: '',
    errIsTty: false,
    out: (t: string) => void (io.stdout += t),
    err: (t: string) => void (io.stderr += t),
    now: () => performance.now(),
  };
  return io;
}

async function run(args: string[]): Promise<{ code: number; stderr: string; stdout: string }> {
  const io = bufferIo();
  const code = await main(args, io);
  return { code, stderr: io.stderr, stdout: io.stdout };
}

/** Parses the CLI's x,y,density CSV into a map keyed by the rounded coordinates. */
function densityCsvRead(path: string): Map<string, number> {
  const lines = readFileSync(path, 'utf8').trim().split('\n');
  expect(lines[0]).toBe('x,y,density');
  const m = new Map<string, number>();
  for (const line of lines.slice(1)) {
    const [x, y, d] = line.split(',').map(Number);
    m.set(`${Math.round(x * 1000)},${Math.round(y * 1000)}`, d);
  }
  return m;
}

function lonLatCsv(name: string, n: number, extra = ''): string {
  const c = demoCustomers(n, 5);
  const rows = Array.from(c.lon, (lon, k) => `${lon},${c.lat[k]},${c.w[k]}`);
  const path = join(dir, name);
  writeFileSync(path, `longitude,latitude,spend\n${rows.join('\n')}\n${extra}`);
  return path;
}

describe('demandscape density reproduces the scipy / scikit-learn reference [S: tests/reference, sklearn 1.2.1]', () => {
  const ref = referenceRead<KdeReference>('kde-planar.json');
  const input = join(REFERENCE_DIR, 'input', 'points-planar.csv');
  const g = ref.grid;
  const extent = `${g.originX},${g.originY},${g.originX + g.width * g.cellSize},${g.originY + g.height * g.cellSize}`;
  const key = (i: number, j: number) =>
    `${Math.round((g.originX + (i + 0.5) * g.cellSize) * 1000)},${Math.round((g.originY + (j + 0.5) * g.cellSize) * 1000)}`;

  // Uniform is checked separately: on a 50 m grid its disc needs cell means (see kde-stencil.ts),
  // so the CLI is compared with the reference's cell means rather than its point values.
  for (const c of ref.cases.filter((k) => k.kernel !== 'uniform')) {
    it(`exact ${c.kernel}: every sampled cell within 1e-9 relative`, async () => {
      const out = join(dir, `ref-${c.kernel}.csv`);
      const args = ['density', '--input', input, '--planar', '--weight', 'weight', '--kernel', c.kernel];
      const r = await run([...args, '--bandwidth', String(c.bandwidth), '--cell-size', '50', '--extent', extent, '--method', 'exact', '--output', out]);
      expect(r.stderr).toMatch(/method {6}exact/);
      expect(r.code).toBe(0);
      const m = densityCsvRead(out);
      expect(m.size).toBe(g.width * g.height);
      const absOfMax = c.kernel === 'gaussian' ? 1e-8 : 1e-12;
      expect(referenceExcess(c, (i, j) => m.get(key(i, j)) as number, 1e-9, absOfMax)).toBeLessThanOrEqual(0);
    });
  }

  it('exact uniform: cell means on the 2 × 2 sub-lattice match sklearn tophat means within 1e-9', async () => {
    const c = ref.cases.find((k) => k.kernel === 'uniform') as (typeof ref.cases)[number];
    const means = c.cellMeans as { oversample: number; values: number[] };
    const out = join(dir, 'ref-uniform.csv');
    const args = ['density', '--input', input, '--planar', '--weight', 'weight', '--kernel', 'uniform', '--bandwidth', String(c.bandwidth)];
    const r = await run([...args, '--cell-size', '50', '--extent', extent, '--method', 'exact', '--output', out]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`cell means on a ${means.oversample} × ${means.oversample} sub-grid`);
    const m = densityCsvRead(out);
    const meanCase = { ...c, samples: c.samples.map(([i, j], k) => [i, j, means.values[k]] as [number, number, number]) };
    expect(referenceExcess(meanCase, (i, j) => m.get(key(i, j)) as number, 1e-9, 1e-12)).toBeLessThanOrEqual(0);
  });

  for (const c of ref.cases.filter((k) => ['gaussian', 'quartic'].includes(k.kernel))) {
    it(`binned ${c.kernel}: every sampled cell within 1e-3 × max`, async () => {
      const out = join(dir, `ref-binned-${c.kernel}.csv`);
      const args = ['density', '--input', input, '--planar', '--weight', 'weight', '--kernel', c.kernel, '--bandwidth', String(c.bandwidth)];
      const r = await run([...args, '--cell-size', '50', '--extent', extent, '--method', 'binned', '--output', out]);
      expect(r.code).toBe(0);
      const m = densityCsvRead(out);
      expect(referenceExcess(c, (i, j) => m.get(key(i, j)) as number, 0, 1e-3)).toBeLessThanOrEqual(0);
    });
  }
});

describe('demandscape density --planar GeoTIFF', () => {
  const input = join(REFERENCE_DIR, 'input', 'points-planar.csv');

  it.each([
    [['--epsg', '3035'], 3035],
    [[], 32767],
  ])('writes the CRS key %j → %i (32767 = user-defined plane)', async (extra, key) => {
    const tif = join(dir, `planar-${key}.tif`);
    const r = await run(['density', '--input', input, '--planar', '--bandwidth', '1500', '--cell-size', '100', '--output', tif, ...(extra as string[])]);
    expect(r.code).toBe(0);
    const image = await (await fromArrayBuffer(new Uint8Array(readFileSync(tif)).buffer)).getImage();
    expect(image.getGeoKeys()?.ProjectedCSTypeGeoKey).toBe(key);
    // The points span x 3,043.3 … 16,595.9 m and y 2,500 … 12,359.1 m; the grid adds the 1.5 km
    // reach and snaps outward to 100 m: west edge 1,500 m, south 1,000 m, north 13,900 m.
    const [ox, oy] = image.getOrigin();
    expect(ox).toBe(1500);
    expect(oy).toBe(13_900);
    expect(oy - image.getHeight() * 100).toBe(1000);
  });
});

describe('demandscape density on lon/lat input', () => {
  const input = lonLatCsv('customers.csv', 3000);
  const tif = join(dir, 'surface.tif');
  const csv = join(dir, 'surface.csv');
  const geojson = join(dir, 'contours.geojson');
  const done = run(['density', '--input', input, '--weight', 'spend', '--bandwidth', '1500', '--cell-size', '100', '--output', tif, '--output', csv, '--output', geojson]);

  it('auto-detects longitude/latitude, projects to UTM 24N and summarises the run', async () => {
    const r = await done;
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/3,000 points/);
    expect(r.stderr).toMatch(/1,500 m radius \(kernel sd 530 m; ≈ Gaussian sd 540 m\) — manual/);
    expect(r.stderr).toMatch(/UTM zone 24N \(EPSG:32624\)/);
    expect(r.stderr).toMatch(/licensed professionals/);
  });

  // Read back with geotiff.js, an independent GeoTIFF reader [S: OGC GeoTIFF 1.1].
  it('writes a GeoTIFF with the UTM EPSG key, the grid geotransform and the peak at the right pixel', async () => {
    const r = await done;
    const image = await (await fromArrayBuffer(new Uint8Array(readFileSync(tif)).buffer)).getImage();
    expect(image.getGeoKeys()?.ProjectedCSTypeGeoKey).toBe(32624);
    const cell = Number(/cell size {3}([\d,.]+) m/.exec(r.stderr)?.[1].replace(/,/g, ''));
    const [sx, sy] = image.getResolution();
    expect(sx).toBe(cell);
    expect(sy).toBe(-cell);
    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    let at = 0;
    for (let k = 1; k < band.length; k++) if (band[k] > band[at]) at = k;
    const peak = Number(/peak {8}([\d,.]+) per km²/.exec(r.stderr)?.[1].replace(/,/g, ''));
    expect(band[at]).toBeCloseTo(peak, -1);
    // Pixel centre of the maximum in UTM metres, then the CSV's lon/lat at the same cell.
    const [ox, oy] = image.getOrigin();
    const col = at % image.getWidth();
    const row = Math.floor(at / image.getWidth());
    const px = ox + (col + 0.5) * sx;
    const py = oy + (row + 0.5) * sy;
    expect(px).toBeGreaterThan(166_000);
    expect(px).toBeLessThan(834_000);
    expect(py).toBeGreaterThan(4_900_000);
    const lines = readFileSync(csv, 'utf8').trim().split('\n');
    const southRow = image.getHeight() - 1 - row;
    const rowAtPeak = lines[1 + col + southRow * image.getWidth()].split(',').map(Number);
    expect(rowAtPeak[2]).toBeCloseTo(band[at], -1);
    expect(rowAtPeak[0]).toBeCloseTo(-38.5, 0);
    expect(rowAtPeak[1]).toBeCloseTo(44.5, 0);
  });

  it('writes 90/75/50 % contours in lon/lat with percent and threshold properties', async () => {
    await done;
    const fc = JSON.parse(readFileSync(geojson, 'utf8'));
    expect(fc.features.map((f: { properties: { percent: number } }) => f.properties.percent)).toEqual([90, 75, 50]);
    const t = fc.features.map((f: { properties: { threshold: number } }) => f.properties.threshold);
    expect(t[0]).toBeLessThan(t[1]);
    expect(t[1]).toBeLessThan(t[2]);
    const [lon, lat] = fc.features[2].geometry.coordinates[0][0][0];
    expect(Math.abs(lon + 38.5)).toBeLessThan(0.3);
    expect(Math.abs(lat - 44.5)).toBeLessThan(0.2);
  });

  it('clips the grid to a lon/lat --extent', async () => {
    const out = join(dir, 'extent.csv');
    const r = await run(['density', '--input', input, '--bandwidth', '1500', '--cell-size', '100', '--extent', '-38.55,44.47,-38.45,44.53', '--output', out]);
    expect(r.code).toBe(0);
    const rows = readFileSync(out, 'utf8').trim().split('\n').slice(1).map((l) => l.split(',').map(Number));
    // Projected edges are curved, so the planar box reaches a little beyond the degree box.
    for (const [lon, lat] of rows) {
      expect(lon).toBeGreaterThan(-38.56);
      expect(lon).toBeLessThan(-38.44);
      expect(lat).toBeGreaterThan(44.46);
      expect(lat).toBeLessThan(44.54);
    }
  });
});

describe('demandscape density rejects bad input with a clear message', () => {
  it('reports every bad row with its line number and exits 2', async () => {
    const input = lonLatCsv('bad.csv', 50, '-38.5,95,3\nabc,44.5,2\n-38.5,44.5,-4\n');
    const r = await run(['density', '--input', input, '--weight', 'spend', '--output', join(dir, 'never.csv')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/3 bad rows \(nothing was computed/);
    expect(r.stderr).toMatch(/line 52: latitude 95 is outside \[-90, 90\]/);
    expect(r.stderr).toMatch(/line 53: longitude "abc" is not a number/);
    expect(r.stderr).toMatch(/line 54: spend -4 is negative/);
    expect(existsSync(join(dir, 'never.csv'))).toBe(false);
  });

  it('lists 20 bad rows, then counts the rest', async () => {
    const input = lonLatCsv('many-bad.csv', 5, Array.from({ length: 26 }, () => 'x,y,1\n').join(''));
    const r = await run(['density', '--input', input, '--output', join(dir, 'never.csv')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/26 bad rows/);
    expect(r.stderr).toMatch(/… and 6 more bad rows/);
  });

  it.each([
    [['--kernel', 'boxcar'], /--kernel must be one of quartic, epanechnikov/],
    [['--bandwidth', 'wide'], /--bandwidth must be metres or one of normal-reference/],
    [['--bandwidth', '-5'], /--bandwidth must be a positive number of metres \(got "-5"\)/],
    [['--extent', '1,2,3'], /--extent must be four numbers/],
    [['--method', 'fast'], /--method must be exact, binned or auto/],
    [['--x', 'e'], /--x\/--y need --planar/],
    [['--projection', 'mercator'], /--projection must be utm or laea/],
    [['--cell-size', '1', '--max-cells', '1000'], /exceeds the 1,000-cell limit; a cell size of .* or more fits/],
  ])('%j', async (extra, message) => {
    const input = lonLatCsv('ok.csv', 200);
    const r = await run(['density', '--input', input, '--output', join(dir, 'o.csv'), ...(extra as string[])]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(message as RegExp);
  });

  it('suggests --projection laea for data wider than a UTM zone, and laea then works', async () => {
    const wide = join(dir, 'wide.csv');
    writeFileSync(wide, 'lon,lat\n-44,44.5\n-38.5,44.6\n-33,44.4\n');
    const utm = await run(['density', '--input', wide, '--bandwidth', '20000', '--output', join(dir, 'w.tif')]);
    expect(utm.code).toBe(1);
    expect(utm.stderr).toMatch(/more than 4\.5° would distort distances .*\(on the command line: --projection laea\)/);
    const tif = join(dir, 'wide.tif');
    const laea = await run(['density', '--input', wide, '--projection', 'laea', '--bandwidth', '20000', '--output', tif]);
    expect(laea.code).toBe(0);
    expect(laea.stderr).toMatch(/Lambert azimuthal equal-area/);
    const image = await (await fromArrayBuffer(new Uint8Array(readFileSync(tif)).buffer)).getImage();
    expect(image.getGeoKeys()?.ProjectedCSTypeGeoKey).toBe(32767);
    expect(image.getGeoKeys()?.GTCitationGeoKey).toMatch(/CRS \+proj=laea/);
  });

  it('asks for at least one --output', async () => {
    const r = await run(['density', '--input', lonLatCsv('ok3.csv', 20)]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/--output is required: give at least one \.csv, \.tif or \.geojson file/);
  });

  it('names a missing input file and an unknown output extension', async () => {
    const missing = await run(['density', '--input', join(dir, 'nope.csv'), '--output', join(dir, 'o.csv')]);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/cannot read --input .*nope\.csv: no such file/);
    const ext = await run(['density', '--input', lonLatCsv('ok2.csv', 20), '--output', join(dir, 'o.png')]);
    expect(ext.code).toBe(1);
    expect(ext.stderr).toMatch(/use \.csv .*\.tif .*\.geojson/);
  });

  it('exits non-zero from a real process with the message on stderr', () => {
    const cli = join(import.meta.dirname, '../src/cli/main.ts');
    const p = spawnSync(process.execPath, ['--import', 'tsx', cli, 'density', '--input', join(dir, 'nope.csv'), '--output', 'x.csv'], {
      encoding: 'utf8',
    });
    expect(p.status).toBe(1);
    expect(p.stderr).toMatch(/^demandscape: cannot read --input/);
  });
});

describe('demandscape --help and demo', () => {
  it('documents every option and the bandwidth convention', async () => {
    const r = await run(['density', '--help']);
    expect(r.code).toBe(0);
    for (const flag of ['--input', '--output', '--lon', '--lat', '--planar', '--x', '--y', '--weight', '--kernel', '--bandwidth', '--cell-size', '--extent', '--method', '--max-cells', '--epsg']) {
      expect(r.stdout).toContain(flag);
    }
    expect(r.stdout).toMatch(/support RADIUS for the compact kernels/);
    expect(r.stdout).toMatch(/STANDARD DEVIATION per axis for gaussian/);
  });

  it('demo writes the CSV, GeoTIFF and contours of the invented Quillport customers', async () => {
    const out = join(dir, 'demo');
    const r = await run(['demo', '--out', out, '--customers', '2000']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/Larchloaf demo: 2,000 invented/);
    for (const f of ['larchloaf-surface.csv', 'larchloaf-surface.tif', 'larchloaf-contours.geojson']) expect(existsSync(join(out, f))).toBe(true);
  });
});

import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { customerPointsLoad } from '../src/modules/customer-file/customer-points.js';
import {
  customerFileImported,
  customerFileSetup,
  customerFileUpload,
  fixture,
  type CustomerFileSetup,
} from './fixtures/customer-files/helpers.js';

/** Data rows of a fixture split naively (no quotes in these fixtures) — an independent reading. */
function fixtureRows(name: string, delimiter: string): string[][] {
  return fixture(name)
    .toString('utf8')
    .split(/\r?\n/)
    .slice(1)
    .filter((l) => l !== '')
    .map((l) => l.split(delimiter));
}

describe('customer files: upload, detection, import', () => {
  let s: CustomerFileSetup;
  beforeAll(async () => {
    s = await customerFileSetup();
  });
  afterAll(() => s.close());

  it('uploads a comma CSV, detects the columns and shows a preview', async () => {
    const res = await customerFileUpload(
      s.owner,
      s.base,
      'larchloaf-customers.csv',
      fixture('good-comma.csv'),
    ).expect(201);
    const { customerFile, preview } = res.body;
    expect(customerFile).toMatchObject({
      name: 'larchloaf-customers.csv',
      format: 'csv',
      status: 'awaiting-mapping',
      rawFileKept: true,
      workspaceId: s.workspaceId,
    });
    expect(customerFile.privacyNote).toBe(
      'Only coordinates and the weight are kept; other columns (names, addresses, e-mails) are discarded at import.',
    );
    expect(preview.columns).toEqual(['customer', 'email', 'latitude', 'longitude', 'annual_spend']);
    expect(preview.detected).toEqual({
      lat: 'latitude',
      lon: 'longitude',
      weight: 'annual_spend',
      delimiter: ',',
      decimalComma: false,
      encoding: 'utf-8',
      hasHeader: true,
    });
    expect(preview.rows).toHaveLength(20);
    expect(preview.rows[0]).toEqual(fixtureRows('good-comma.csv', ',')[0]);
    expect(preview.rows[0].slice(0, 2)).toEqual(['Wren Saltmarsh 1', 'wren1@larchloaf.example']);
    const again = await s.owner.get(`${s.base}/${customerFile.id}/preview`).expect(200);
    expect(again.body.preview).toEqual(preview);
  });

  it('imports only coordinates and weight, deletes the raw upload, and keeps no other column', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'c.csv', fixture('good-comma.csv')).expect(
      201,
    );
    const id = up.body.customerFile.id;
    const f = await customerFileImported(s.owner, s.base, id, {
      mapping: { lon: 'longitude', lat: 'latitude', weight: 'annual_spend' },
      weightKind: 'spend',
      weightLabel: 'annual spend (€)',
    });
    expect(f).toMatchObject({
      status: 'imported',
      rowCount: 30,
      acceptedCount: 30,
      rejectedCount: 0,
      flaggedCount: 0,
      excludedCount: 0,
      weightKind: 'spend',
      weightLabel: 'annual spend (€)',
      rawFileKept: false,
    });
    // Σ (120 + 7.5 i), i = 0…29 = 30·120 + 7.5·435 [D]
    expect(f.totalWeight).toBeCloseTo(3600 + 3262.5, 9);
    const rows = fixtureRows('good-comma.csv', ',');
    const lats = rows.map((r) => Number(r[2]));
    const lons = rows.map((r) => Number(r[3]));
    expect(f.bbox).toEqual([
      Math.min(...lons),
      Math.min(...lats),
      Math.max(...lons),
      Math.max(...lats),
    ]);
    expect(readdirSync(join(s.dataDir, 'uploads'))).not.toContain(expect.anything());

    const points = await customerPointsLoad(s.ds.orm.em.fork(), id);
    expect(points.count).toBe(30);
    expect([points.lon[0], points.lat[0], points.w[0]]).toEqual([
      Number(rows[0][3]),
      Number(rows[0][2]),
      120,
    ]);

    // Inspect every table's text: no name or e-mail from the file is stored anywhere.
    const conn = s.ds.orm.em.fork().getConnection();
    const tables = (
      await conn.execute<{ name: string }[]>("select name from sqlite_master where type = 'table'")
    ).map((t) => t.name);
    for (const table of tables) {
      const rows = await conn.execute<Record<string, unknown>[]>(`select * from \`${table}\``);
      const text = JSON.stringify(rows, (_k, v) => (Buffer.isBuffer(v) ? v.toString('latin1') : v));
      expect(text, table).not.toContain('Wren Saltmarsh');
      expect(text, table).not.toContain('wren1@larchloaf');
    }
    await s.owner
      .get(`${s.base}/${id}/preview`)
      .expect(409)
      .expect((r) => expect(r.body.error.code).toBe('RAW_FILE_DISCARDED'));
    await s.owner
      .post(`${s.base}/${id}/import`, {
        mapping: { lon: 'longitude', lat: 'latitude' },
        weightKind: 'count',
      })
      .expect(409);
  });

  it('reads semicolon-separated files with decimal commas', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'kunden.csv',
      fixture('semicolon-decimal-comma.csv'),
    ).expect(201);
    expect(up.body.preview.detected).toMatchObject({
      delimiter: ';',
      decimalComma: true,
      encoding: 'utf-8',
      lat: 'Breite',
      lon: 'Länge',
      weight: 'Umsatz',
    });
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'Länge', lat: 'Breite', weight: 'Umsatz' },
      weightKind: 'spend',
    });
    expect(f).toMatchObject({ status: 'imported', acceptedCount: 12, rejectedCount: 0 });
    // Σ (100.5 + i), i = 0…11 [D]
    expect(f.totalWeight).toBeCloseTo(12 * 100.5 + 66, 9);
    const points = await customerPointsLoad(s.ds.orm.em.fork(), f.id);
    const second = fixtureRows('semicolon-decimal-comma.csv', ';')[1];
    expect([points.lon[1], points.lat[1]]).toEqual([
      Number(second[2].replace(',', '.')),
      Number(second[1].replace(',', '.')),
    ]);
  });

  it('keeps a non-ASCII file name as sent', async () => {
    const res = await customerFileUpload(
      s.owner,
      s.base,
      'Kundenliste März.csv',
      fixture('utf8-bom.csv'),
    ).expect(201);
    expect(res.body.customerFile.name).toBe('Kundenliste März.csv');
  });

  it('strips a UTF-8 byte-order mark from the first column name', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'bom.csv', fixture('utf8-bom.csv')).expect(
      201,
    );
    expect(up.body.preview.columns).toEqual(['lat', 'lon', 'visits']);
    expect(up.body.preview.detected).toMatchObject({
      encoding: 'utf-8-bom',
      lat: 'lat',
      lon: 'lon',
      weight: 'visits',
    });
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'lon', lat: 'lat', weight: 'visits' },
      weightKind: 'visits',
    });
    expect(f).toMatchObject({ status: 'imported', acceptedCount: 6, totalWeight: 21 });
  });

  it('decodes Latin-1 text ("Länge", "Müller") and maps its German headers', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'besuche.csv',
      fixture('latin1.csv'),
    ).expect(201);
    const { preview } = up.body;
    expect(preview.columns).toEqual(['Name', 'Breite', 'Länge', 'Straße', 'Besuche']);
    expect(preview.rows[0][0]).toBe('Jörg Müller-Brötchen 1');
    expect(preview.detected).toMatchObject({
      encoding: 'latin1',
      delimiter: ';',
      decimalComma: false,
      lat: 'Breite',
      lon: 'Länge',
      weight: 'Besuche',
    });
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'Länge', lat: 'Breite', weight: 'Besuche' },
      weightKind: 'visits',
    });
    // Σ (i + 2), i = 0…7 [D]
    expect(f).toMatchObject({ status: 'imported', acceptedCount: 8, totalWeight: 44 });
  });

  it('reads the first worksheet of an XLSX workbook', async () => {
    const wb = new ExcelJS.Workbook();
    const sheet = wb.addWorksheet('Kunden');
    sheet.addRow(['Customer', 'Lat', 'Lng', 'Visits']);
    for (let i = 0; i < 25; i++)
      sheet.addRow([`Tamsin Gorse ${i}`, 44.5 + i * 0.001, -38.5 - i * 0.001, i % 4]);
    sheet.addRow([
      'Formula row',
      { formula: '44.5+0.0005', result: 44.5005 },
      -38.5,
      { formula: '1+1', result: 2 },
    ]);
    wb.addWorksheet('Ignored').addRow(['lat', 'lon']);
    const bytes = Buffer.from(await wb.xlsx.writeBuffer());
    const up = await customerFileUpload(s.owner, s.base, 'customers.xlsx', bytes).expect(201);
    expect(up.body.customerFile.format).toBe('xlsx');
    expect(up.body.preview.columns).toEqual(['Customer', 'Lat', 'Lng', 'Visits']);
    expect(up.body.preview.rows[1]).toEqual(['Tamsin Gorse 1', '44.501', '-38.501', '1']);
    expect(up.body.preview.detected).toMatchObject({ lat: 'Lat', lon: 'Lng', weight: 'Visits' });
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'Lng', lat: 'Lat', weight: 'Visits' },
      weightKind: 'visits',
    });
    // Σ (i mod 4), i = 0…24 = 6·(0+1+2+3) + 0, plus 2 from the formula row [D]
    expect(f).toMatchObject({
      status: 'imported',
      rowCount: 26,
      acceptedCount: 26,
      totalWeight: 38,
    });
  });

  it('lets the mapping override a wrong suggestion', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'homes.csv',
      fixture('mapping-override.csv'),
    ).expect(201);
    // The first latitude-like column is the store's; the analyst wants the customers' homes and the visit count.
    expect(up.body.preview.detected).toMatchObject({
      lat: 'store_lat',
      lon: 'store_lon',
      weight: 'spend',
    });
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'home_lon', lat: 'home_lat', weight: 'count' },
      weightKind: 'count',
    });
    // Σ (i mod 3 + 1), i = 0…9 [D]
    expect(f).toMatchObject({
      status: 'imported',
      acceptedCount: 10,
      totalWeight: 19,
      mapping: { lon: 'home_lon', lat: 'home_lat', weight: 'count' },
    });
    const homeLats = fixtureRows('mapping-override.csv', ',').map((r) => Number(r[3]));
    expect([f.bbox![1], f.bbox![3]]).toEqual([Math.min(...homeLats), Math.max(...homeLats)]);
  });

  it('counts every customer once when no weight column is mapped', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'c.csv', fixture('good-comma.csv')).expect(
      201,
    );
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      mapping: { lon: 'longitude', lat: 'latitude' },
      weightKind: 'count',
    });
    expect(f).toMatchObject({ status: 'imported', totalWeight: 30, weightLabel: 'customers' });
  });

  it('refuses a mapping that names a missing column, or the same column twice', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'c.csv', fixture('good-comma.csv')).expect(
      201,
    );
    const url = `${s.base}/${up.body.customerFile.id}/import`;
    const missing = await s.owner
      .post(url, { mapping: { lon: 'lng', lat: 'latitude' }, weightKind: 'count' })
      .expect(400);
    expect(missing.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'mapping.lon' });
    expect(missing.body.error.message).toContain(
      '"customer", "email", "latitude", "longitude", "annual_spend"',
    );
    const same = await s.owner
      .post(url, { mapping: { lon: 'latitude', lat: 'latitude' }, weightKind: 'count' })
      .expect(400);
    expect(same.body.error.field).toBe('mapping.lat');
    const kind = await s.owner
      .post(url, { mapping: { lon: 'longitude', lat: 'latitude' }, weightKind: 'money' })
      .expect(400);
    expect(kind.body.error.field).toBe('weightKind');
  });

  it('fails an import where no row is valid, keeping the raw file to map again', async () => {
    const up = await customerFileUpload(s.owner, s.base, 'c.csv', fixture('good-comma.csv')).expect(
      201,
    );
    const id = up.body.customerFile.id;
    const f = await customerFileImported(s.owner, s.base, id, {
      mapping: { lon: 'email', lat: 'customer' },
      weightKind: 'count',
    });
    expect(f).toMatchObject({
      status: 'failed',
      error: { code: 'NO_VALID_ROWS' },
      rowCount: 30,
      acceptedCount: 0,
      rejectedCount: 30,
      rawFileKept: true,
    });
    expect(f.report!.rejected).toEqual({ 'non-numeric-coordinate': 30 });
    const again = await customerFileImported(s.owner, s.base, id, {
      mapping: { lon: 'longitude', lat: 'latitude' },
      weightKind: 'count',
    });
    expect(again).toMatchObject({ status: 'imported', acceptedCount: 30, error: null });
  });

  it('lists the files of the workspace and deletes one with its points', async () => {
    const list = await s.owner.get(s.base).expect(200);
    expect(list.body.customerFiles.length).toBeGreaterThan(3);
    const imported = list.body.customerFiles.find(
      (f: { status: string }) => f.status === 'imported',
    );
    await s.owner.del(`${s.base}/${imported.id}`).expect(204);
    await s.owner.get(`${s.base}/${imported.id}`).expect(404);
    expect((await customerPointsLoad(s.ds.orm.em.fork(), imported.id)).count).toBe(0);
    const pending = list.body.customerFiles.find(
      (f: { status: string }) => f.status === 'awaiting-mapping',
    );
    const before = readdirSync(join(s.dataDir, 'uploads')).length;
    await s.owner.del(`${s.base}/${pending.id}`).expect(204);
    expect(readdirSync(join(s.dataDir, 'uploads')).length).toBe(before - 1);
  });
});

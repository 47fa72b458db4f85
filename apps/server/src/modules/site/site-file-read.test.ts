import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, describe, expect, it } from 'vitest';
import { SITE_FILE_MAX_COLUMNS, SITE_FILE_MAX_ROWS, siteFileRead } from './site-file-read.js';

const dir = mkdtempSync(join(tmpdir(), 'ds-site-file-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let n = 0;
function stored(bytes: Buffer | string): string {
  const path = join(dir, `f${n++}`);
  writeFileSync(path, bytes);
  return path;
}

describe('siteFileRead', () => {
  it('reads a UTF-8 CSV with a BOM, semicolons and decimal commas', async () => {
    const t = await siteFileRead(stored('\uFEFFSite name;Longitude;Latitude;Floor area (m²)\nQuay corner;-38,51;44,52;120\n\nHarbour Row;-38,5;44,5;180,5\n'));
    expect(t).toMatchObject({ format: 'csv', hasHeader: true, decimalComma: true, firstRow: 2, columns: ['Site name', 'Longitude', 'Latitude', 'Floor area (m²)'] });
    // Blank lines are left out (and not counted in row numbers), as in customer files.
    expect(t.rows).toEqual([
      ['Quay corner', '-38,51', '44,52', '120'],
      ['Harbour Row', '-38,5', '44,5', '180,5'],
    ]);
  });

  it('reads Latin-1 text and a file without a header', async () => {
    const t = await siteFileRead(stored(Buffer.from('Café Mühle,own,-38.51,44.50,180\nRival,competitor,-38.49,44.52,90\n', 'latin1')));
    expect(t).toMatchObject({ hasHeader: false, firstRow: 1, columns: ['column 1', 'column 2', 'column 3', 'column 4', 'column 5'] });
    expect(t.rows[0][0]).toBe('Café Mühle');
  });

  it('reads the first worksheet of an XLSX workbook, formula cells as their saved values', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Candidates');
    ws.addRow(['Site', 'Lng', 'Lat', 'Size']);
    ws.addRow(['Quay corner', -38.51, 44.52, { formula: '100+20', result: 120 }]);
    ws.addRow(['Never calculated', -38.5, 44.5, { formula: '100+20' }]);
    wb.addWorksheet('Other').addRow(['ignored']);
    const t = await siteFileRead(stored(Buffer.from(await wb.xlsx.writeBuffer())));
    expect(t).toMatchObject({ format: 'xlsx', hasHeader: true, decimalComma: false, columns: ['Site', 'Lng', 'Lat', 'Size'] });
    expect(t.rows).toEqual([
      ['Quay corner', '-38.51', '44.52', '120'],
      // No saved value: read as empty (trailing empty cells are dropped).
      ['Never calculated', '-38.5', '44.5'],
    ]);
  });

  it('names empty files, other file types and files over the row limit', async () => {
    await expect(siteFileRead(stored(''))).rejects.toMatchObject({ status: 400, code: 'EMPTY_FILE', message: expect.stringMatching(/one site per row/) });
    await expect(siteFileRead(stored(Buffer.from('%PDF-1.7\n…')))).rejects.toMatchObject({ status: 415, code: 'UNSUPPORTED_FILE_TYPE', message: expect.stringMatching(/a PDF document, not a sites table/) });
    await expect(siteFileRead(stored(Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4])))).rejects.toMatchObject({ status: 415, message: expect.stringMatching(/not a readable \.xlsx workbook/) });
    const wide = await siteFileRead(stored('name,lon,lat\n' + 'x,'.repeat(SITE_FILE_MAX_COLUMNS) + 'y\n')).catch((e: unknown) => e);
    expect(wide).toMatchObject({ code: 'TOO_MANY_COLUMNS', message: expect.stringMatching(/has 101 columns; a sites file may have at most 100/) });
    const header = 'name,kind,lon,lat,attractiveness\n';
    const atLimit = await siteFileRead(stored(header + 'S,own,-38.5,44.5,1\n'.repeat(SITE_FILE_MAX_ROWS)));
    expect(atLimit.rows).toHaveLength(SITE_FILE_MAX_ROWS);
    await expect(siteFileRead(stored(header + 'S,own,-38.5,44.5,1\n'.repeat(SITE_FILE_MAX_ROWS + 1)))).rejects.toMatchObject({ code: 'TOO_MANY_ROWS', message: expect.stringMatching(/more than 5,000 sites/) });
  });
});

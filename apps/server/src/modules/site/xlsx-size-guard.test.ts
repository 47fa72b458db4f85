import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, describe, expect, it } from 'vitest';
import { xlsxExpandedSizeCheck } from './xlsx-size-guard.js';

const dir = mkdtempSync(join(tmpdir(), 'ds-xlsx-guard-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('xlsxExpandedSizeCheck', () => {
  it('sums the declared unpacked sizes and refuses a workbook that unpacks to more than the limit', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Sites');
    // 20,000 identical cells: highly compressible, like a zip bomb in miniature.
    for (let r = 0; r < 2000; r++) ws.addRow(Array.from({ length: 10 }, () => 'Quillport'));
    const bytes = Buffer.from(await wb.xlsx.writeBuffer());
    const path = join(dir, 'big.xlsx');
    writeFileSync(path, bytes);
    const total = await xlsxExpandedSizeCheck(path);
    // Every row's XML is far longer than its packed share [D].
    expect(total).toBeGreaterThan(5 * bytes.length);
    await expect(xlsxExpandedSizeCheck(path, total - 1)).rejects.toMatchObject({ status: 400, code: 'FILE_TOO_LARGE', message: expect.stringMatching(/unpacks to more than/) });
    await expect(xlsxExpandedSizeCheck(path, total)).resolves.toBe(total);
  });

  it('refuses a zip whose directory is missing or cut off', async () => {
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet('Sites').addRow(['name']);
    const bytes = Buffer.from(await wb.xlsx.writeBuffer());
    const cut = join(dir, 'cut.xlsx');
    writeFileSync(cut, bytes.subarray(0, Math.floor(bytes.length / 2)));
    await expect(xlsxExpandedSizeCheck(cut)).rejects.toMatchObject({ status: 415, message: expect.stringMatching(/no zip directory/) });
  });
});

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { rowsRead, xlsxCellText } from './row-reader.js';

describe('rowsRead (CSV)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ds-rows-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const read = async (
    text: string | Buffer,
    options: Parameters<typeof rowsRead>[1],
    stopAfter = Infinity,
  ) => {
    const path = join(dir, `f${Math.random()}.csv`);
    writeFileSync(path, text);
    const rows: string[][] = [];
    await rowsRead(path, options, (fields) => {
      rows.push(fields);
      return rows.length < stopAfter;
    });
    return rows;
  };

  it('skips blank and blank-looking lines and keeps quoted delimiters and line breaks', async () => {
    const rows = await read(
      'name,lat,lon\r\n"Quill, Ada",44.5,-38.5\r\n  \r\n , \r\n\r\n"two\nlines",44.6,-38.4\r\n',
      { format: 'csv', delimiter: ',' },
    );
    expect(rows).toEqual([
      ['name', 'lat', 'lon'],
      ['Quill, Ada', '44.5', '-38.5'],
      ['two\nlines', '44.6', '-38.4'],
    ]);
  });
  it('stops when the callback says so', async () => {
    const rows = await read('a,b\n' + '1,2\n'.repeat(10_000), { format: 'csv', delimiter: ',' }, 3);
    expect(rows).toHaveLength(3);
  });
  it('decodes Latin-1 and drops the UTF-8 byte-order mark', async () => {
    expect(
      await read(Buffer.from([0x4c, 0xe4, 0x6e, 0x67, 0x65, 0x3b, 0x78, 0x0a]), {
        format: 'csv',
        delimiter: ';',
        encoding: 'latin1',
      }),
    ).toEqual([['Länge', 'x']]);
    expect(
      await read('\ufefflat,lon\n', { format: 'csv', delimiter: ',', encoding: 'utf-8-bom' }),
    ).toEqual([['lat', 'lon']]);
  });
});

describe('xlsxCellText', () => {
  it('turns every kind of cell value into text', () => {
    expect(xlsxCellText(44.123456789)).toBe('44.123456789');
    expect(xlsxCellText({ richText: [{ text: 'Läng' }, { text: 'e' }] })).toBe('Länge');
    expect(xlsxCellText({ formula: 'A1*2', result: 8.5 })).toBe('8.5');
    expect(xlsxCellText({ text: 'site', hyperlink: 'http://x.example' })).toBe('site');
    expect(xlsxCellText(new Date(Date.UTC(2026, 11, 2)))).toBe('2026-12-02T00:00:00.000Z');
    expect(xlsxCellText(null)).toBe('');
    expect(xlsxCellText({ error: '#N/A' })).toBe('#N/A');
  });
});

describe('rowsRead: plain splitting gives the same rows as the CSV parser', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ds-rows2-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  it.each([
    ['LF', 'name;lat;lon\nA;44,5;-38,5\n\n  \n;;\nB;44,6;\nC'],
    ['CRLF with a BOM', '\ufefflat,lon\r\n44.5,-38.5\r\n\r\n44.6,-38.4\r\n'],
  ])('%s', async (_name, text) => {
    const path = join(dir, `${_name}.csv`);
    writeFileSync(path, text);
    const delimiter = text.includes(';') ? ';' : ',';
    const collect = async (simpleLines: boolean) => {
      const rows: string[][] = [];
      await rowsRead(path, { format: 'csv', delimiter, simpleLines }, (f) => void rows.push(f));
      return rows;
    };
    const parsed = await collect(false);
    expect(parsed.length).toBeGreaterThan(1);
    expect(await collect(true)).toEqual(parsed);
  });
});

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { textScan } from './file-sniff.js';

describe('textScan', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ds-sniff-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const encodingOf = async (path: string) => (await textScan(path)).encoding;
  const write = (name: string, bytes: Buffer) => {
    const path = join(dir, name);
    writeFileSync(path, bytes);
    return path;
  };

  it('keeps UTF-8 when a multi-byte character straddles the 1 MiB read boundary', async () => {
    const pad = Buffer.alloc((1 << 20) - 1, 0x61);
    expect(await encodingOf(write('u.csv', Buffer.concat([pad, Buffer.from('ü\n')])))).toBe(
      'utf-8',
    );
  });
  it('finds a Latin-1 byte late in a large file', async () => {
    const pad = Buffer.alloc(3 << 20, 0x61);
    expect(await encodingOf(write('l.csv', Buffer.concat([pad, Buffer.from([0xfc, 0x0a])])))).toBe(
      'latin1',
    );
  });
  it('reports the byte-order mark', async () => {
    expect(await encodingOf(write('b.csv', Buffer.from('\ufefflat,lon\n')))).toBe('utf-8-bom');
  });
  it('allows plain line splitting only without quotes and without \\r-only line ends', async () => {
    expect(await textScan(write('p.csv', Buffer.from('a,b\r\n1,2\r\n')))).toEqual({
      encoding: 'utf-8',
      simpleLines: true,
    });
    expect((await textScan(write('q.csv', Buffer.from('a,b\n"1",2\n')))).simpleLines).toBe(false);
    expect((await textScan(write('r.csv', Buffer.from('a,b\r1,2\r')))).simpleLines).toBe(false);
    expect(await textScan(write('s.csv', Buffer.from([0x61, 0xfc, 0x22, 0x0a])))).toEqual({
      encoding: 'latin1',
      simpleLines: false,
    });
  });
  it('calls a file ending in a cut-off UTF-8 sequence Latin-1', async () => {
    expect(await encodingOf(write('c.csv', Buffer.from([0x61, 0xc3])))).toBe('latin1');
  });
});

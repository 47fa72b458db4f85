import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { textEncodingDetect } from './file-sniff.js';

describe('textEncodingDetect', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ds-sniff-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const write = (name: string, bytes: Buffer) => {
    const path = join(dir, name);
    writeFileSync(path, bytes);
    return path;
  };

  it('keeps UTF-8 when a multi-byte character straddles the 1 MiB read boundary', async () => {
    const pad = Buffer.alloc((1 << 20) - 1, 0x61);
    expect(await textEncodingDetect(write('u.csv', Buffer.concat([pad, Buffer.from('ü\n')])))).toBe('utf-8');
  });
  it('finds a Latin-1 byte late in a large file', async () => {
    const pad = Buffer.alloc(3 << 20, 0x61);
    expect(await textEncodingDetect(write('l.csv', Buffer.concat([pad, Buffer.from([0xfc, 0x0a])])))).toBe('latin1');
  });
  it('reports the byte-order mark', async () => {
    expect(await textEncodingDetect(write('b.csv', Buffer.from('\ufefflat,lon\n')))).toBe('utf-8-bom');
  });
  it('calls a file ending in a cut-off UTF-8 sequence Latin-1', async () => {
    expect(await textEncodingDetect(write('c.csv', Buffer.from([0x61, 0xc3])))).toBe('latin1');
  });
});

import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { isUtf8 } from 'node:buffer';
import { AppError } from '../common/errors.js';

/** What the first bytes say about an upload. */
export interface FileSniff {
  format: 'csv' | 'xlsx';
}

const UNSUPPORTED =
  'Upload a CSV (comma, semicolon, tab or | separated text) or an Excel .xlsx workbook.';

/**
 * Decides by content (not by name) whether an upload is an XLSX workbook (zip magic `PK\x03\x04`)
 * or delimited text; anything else is refused with 415 and a message saying what to upload instead.
 * @param path - the stored upload
 * @returns the format
 * @throws AppError 415 UNSUPPORTED_FILE_TYPE (binary, old .xls, UTF-16 text), 400 EMPTY_FILE
 * @example
 * const { format } = await fileSniff('/data/uploads/5b0e…');
 */
export async function fileSniff(path: string): Promise<FileSniff> {
  const handle = await open(path, 'r');
  const head = Buffer.alloc(8192);
  let length: number;
  try {
    ({ bytesRead: length } = await handle.read(head, 0, head.length, 0));
  } finally {
    await handle.close();
  }
  const bytes = head.subarray(0, length);
  if (length === 0 || bytes.toString('latin1').trim() === '')
    throw new AppError(
      400,
      'EMPTY_FILE',
      'The file is empty. Upload a CSV or XLSX file with a header line and one customer per row.',
      'file',
    );
  if (bytes[0] === 0x50 && bytes[1] === 0x4b && bytes[2] === 0x03 && bytes[3] === 0x04)
    return { format: 'xlsx' };
  if (bytes[0] === 0xd0 && bytes[1] === 0xcf && bytes[2] === 0x11 && bytes[3] === 0xe0) {
    throw new AppError(
      415,
      'UNSUPPORTED_FILE_TYPE',
      `This is an old Excel 97–2003 (.xls) or other Office binary file. Save it as .xlsx or CSV and upload again.`,
      'file',
    );
  }
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw new AppError(
      415,
      'UNSUPPORTED_FILE_TYPE',
      'This text file is UTF-16 encoded. Save it as "CSV UTF-8" (or Latin-1) and upload again.',
      'file',
    );
  }
  const other = binaryKind(bytes);
  if (other)
    throw new AppError(
      415,
      'UNSUPPORTED_FILE_TYPE',
      `This is ${other}, not a customer table. ${UNSUPPORTED}`,
      'file',
    );
  if (bytes.includes(0))
    throw new AppError(
      415,
      'UNSUPPORTED_FILE_TYPE',
      `The file is not text and not an XLSX workbook (it contains binary data). ${UNSUPPORTED}`,
      'file',
    );
  return { format: 'csv' };
}

const MAGIC: [string, number[]][] = [
  ['a PDF document', [0x25, 0x50, 0x44, 0x46]],
  ['a PNG image', [0x89, 0x50, 0x4e, 0x47]],
  ['a JPEG image', [0xff, 0xd8, 0xff]],
  ['a GIF image', [0x47, 0x49, 0x46, 0x38]],
  ['a gzip archive', [0x1f, 0x8b]],
  ['a 7-Zip archive', [0x37, 0x7a, 0xbc, 0xaf]],
  ['a RAR archive', [0x52, 0x61, 0x72, 0x21]],
];

function binaryKind(bytes: Buffer): string | null {
  for (const [name, magic] of MAGIC) if (magic.every((b, i) => bytes[i] === b)) return name;
  const start = bytes.subarray(0, 64).toString('latin1').trimStart().toLowerCase();
  if (start.startsWith('<?xml') || start.startsWith('<!doctype') || start.startsWith('<html'))
    return 'an XML or HTML document';
  return null;
}

/** What one pass over a text file found. */
export interface TextScan {
  encoding: 'utf-8' | 'utf-8-bom' | 'latin1';
  /**
   * No `"` anywhere and lines end in `\n` (or `\r\n`): rows can be split on line breaks and the
   * delimiter directly, without the full CSV parser.
   */
  simpleLines: boolean;
}

/**
 * Reads a whole text file once: its encoding — UTF-8 with or without byte-order mark when every
 * byte sequence is valid UTF-8, else Latin-1 (decoded as Windows-1252, the WHATWG meaning of
 * "latin1", which also covers €) — and whether it has quotes or old-style `\r`-only line ends.
 * The whole file is read so a stray byte late in the file is not missed.
 * @param path - the file
 * @returns the encoding and whether plain line splitting is safe
 * @example
 * await textScan('/data/uploads/5b0e…'); // { encoding: 'utf-8-bom', simpleLines: true }
 */
export async function textScan(path: string): Promise<TextScan> {
  let first = true;
  let bom = false;
  let utf8 = true;
  let quote = false;
  let lf = false;
  let cr = false;
  let carry: Buffer = Buffer.alloc(0);
  for await (const chunk of createReadStream(path, {
    highWaterMark: 1 << 20,
  }) as AsyncIterable<Buffer>) {
    if (!quote && chunk.includes(0x22)) quote = true;
    if (!lf && chunk.includes(0x0a)) lf = true;
    if (!cr && chunk.includes(0x0d)) cr = true;
    if (!utf8) continue;
    let data = carry.length > 0 ? Buffer.concat([carry, chunk]) : chunk;
    if (first) {
      first = false;
      bom = data.length >= 3 && data[0] === 0xef && data[1] === 0xbb && data[2] === 0xbf;
    }
    const cut = utf8SafeEnd(data);
    carry = Buffer.from(data.subarray(cut));
    data = data.subarray(0, cut);
    if (!isUtf8(data)) utf8 = false;
  }
  if (utf8 && carry.length > 0 && !isUtf8(carry)) utf8 = false;
  return {
    encoding: !utf8 ? 'latin1' : bom ? 'utf-8-bom' : 'utf-8',
    simpleLines: !quote && (lf || !cr),
  };
}

/** Index where an incomplete trailing UTF-8 sequence starts (or the length when none). */
function utf8SafeEnd(data: Buffer): number {
  const n = data.length;
  for (let back = 1; back <= Math.min(3, n); back++) {
    const b = data[n - back];
    if ((b & 0xc0) === 0x80) continue;
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
    return need > back ? n - back : n;
  }
  return n;
}

/**
 * The WHATWG decoder label for a detected encoding.
 * @param encoding - from `textEncodingDetect`
 * @returns a TextDecoder label
 * @example
 * new TextDecoder(textDecoderLabel('latin1'));
 */
export function textDecoderLabel(encoding: 'utf-8' | 'utf-8-bom' | 'latin1'): string {
  return encoding === 'latin1' ? 'windows-1252' : 'utf-8';
}

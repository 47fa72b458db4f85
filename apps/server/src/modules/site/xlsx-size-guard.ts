import { open } from 'node:fs/promises';
import { AppError } from '../common/errors.js';

/** Most bytes the parts of one sites workbook may unpack to (a 2 MB upload of real sites unpacks to a few MB). */
export const XLSX_MAX_EXPANDED_BYTES = 64 * 1024 * 1024;

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;

/**
 * Sums the unpacked sizes that a zip's central directory declares (APPNOTE.TXT §4.3.12, §4.3.16
 * [S]) and refuses a workbook that would unpack to more than `maxBytes` (a "zip bomb"), before any
 * XML is parsed. Zip64 sizes count as too large.
 * @param path - the stored upload (an XLSX by its magic bytes)
 * @param maxBytes - the limit (default XLSX_MAX_EXPANDED_BYTES)
 * @returns the declared unpacked total in bytes
 * @throws AppError 415 UNSUPPORTED_FILE_TYPE when the directory cannot be read, 400 FILE_TOO_LARGE over the limit
 * @example
 * await xlsxExpandedSizeCheck('/tmp/demandscape-sites-…');
 */
export async function xlsxExpandedSizeCheck(path: string, maxBytes = XLSX_MAX_EXPANDED_BYTES): Promise<number> {
  const handle = await open(path, 'r');
  try {
    const { size } = await handle.stat();
    // The end record is 22 bytes plus a comment of at most 65,535 bytes.
    const tailLength = Math.min(size, 22 + 65_535);
    const tail = Buffer.alloc(tailLength);
    await handle.read(tail, 0, tailLength, size - tailLength);
    let end = -1;
    for (let i = tailLength - 22; i >= 0; i--) {
      if (tail.readUInt32LE(i) === EOCD) {
        end = i;
        break;
      }
    }
    if (end < 0) throw unreadable('no zip directory at the end of the file');
    const entries = tail.readUInt16LE(end + 10);
    const dirSize = tail.readUInt32LE(end + 12);
    const dirOffset = tail.readUInt32LE(end + 16);
    if (dirOffset + dirSize > size) throw unreadable('the zip directory points past the end of the file');
    const dir = Buffer.alloc(dirSize);
    await handle.read(dir, 0, dirSize, dirOffset);
    let total = 0;
    let at = 0;
    for (let k = 0; k < entries; k++) {
      if (at + 46 > dirSize || dir.readUInt32LE(at) !== CENTRAL) throw unreadable('a damaged zip directory');
      const unpacked = dir.readUInt32LE(at + 24);
      total += unpacked === 0xffffffff ? Number.POSITIVE_INFINITY : unpacked;
      at += 46 + dir.readUInt16LE(at + 28) + dir.readUInt16LE(at + 30) + dir.readUInt16LE(at + 32);
    }
    if (total > maxBytes) {
      throw new AppError(400, 'FILE_TOO_LARGE', `The workbook unpacks to more than ${Math.round(maxBytes / (1024 * 1024))} MB; a sites file needs far less. Save only the sites sheet (or export it as CSV) and upload again.`, 'file');
    }
    return total;
  } finally {
    await handle.close();
  }
}

function unreadable(why: string): AppError {
  return new AppError(415, 'UNSUPPORTED_FILE_TYPE', `The file looks like a zip archive but is not a readable .xlsx workbook (${why}). Save it again as .xlsx or CSV.`, 'file');
}

import type { EntityManager } from '@mikro-orm/sqlite';
import { CustomerPointChunkSchema } from './customer-point-chunk.entity.js';

/** Customer points as parallel arrays: lon/lat in degrees (WGS84), w the file's weight. */
export interface CustomerPoints {
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
  count: number;
}

const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

/**
 * Packs points `[start, start + count)` into one chunk blob: little-endian Float64
 * [lon₀…lonₙ₋₁, lat₀…latₙ₋₁, w₀…wₙ₋₁].
 * @param points - the arrays
 * @param start - first index (default 0)
 * @param count - how many (default all from start)
 * @returns the blob (3·count·8 bytes)
 * @example
 * const blob = customerPointsPack({ lon, lat, w, count: lon.length });
 */
export function customerPointsPack(
  points: CustomerPoints,
  start = 0,
  count = points.count - start,
): Buffer {
  const out = Buffer.allocUnsafe(count * 24);
  if (LITTLE_ENDIAN) {
    const view = new Float64Array(out.buffer, out.byteOffset, count * 3);
    view.set(points.lon.subarray(start, start + count), 0);
    view.set(points.lat.subarray(start, start + count), count);
    view.set(points.w.subarray(start, start + count), 2 * count);
    return out;
  }
  for (let i = 0; i < count; i++) {
    out.writeDoubleLE(points.lon[start + i], i * 8);
    out.writeDoubleLE(points.lat[start + i], (count + i) * 8);
    out.writeDoubleLE(points.w[start + i], (2 * count + i) * 8);
  }
  return out;
}

/**
 * Reads a chunk blob written by `customerPointsPack`.
 * @param blob - 24·n bytes
 * @returns the points (copies, safe to keep)
 * @throws Error when the blob length is not a multiple of 24 bytes
 * @example
 * const { lon, lat, w } = customerPointsUnpack(chunk.data);
 */
export function customerPointsUnpack(blob: Uint8Array): CustomerPoints {
  if (blob.byteLength % 24 !== 0)
    throw new Error(`customer point chunk must be a multiple of 24 bytes (got ${blob.byteLength})`);
  const count = blob.byteLength / 24;
  const lon = new Float64Array(count);
  const lat = new Float64Array(count);
  const w = new Float64Array(count);
  const view = new DataView(blob.buffer, blob.byteOffset, blob.byteLength);
  for (let i = 0; i < count; i++) {
    lon[i] = view.getFloat64(i * 8, true);
    lat[i] = view.getFloat64((count + i) * 8, true);
    w[i] = view.getFloat64((2 * count + i) * 8, true);
  }
  return { lon, lat, w, count };
}

/**
 * All stored points of a customer file, in upload order (chunks by `seq`).
 * Callers check organization and workspace before calling; this reads by id only.
 * @param em - entity manager
 * @param customerFileId - the customer file
 * @returns lon, lat, weight arrays and the count (0 when nothing is stored)
 * @example
 * const { lon, lat, w, count } = await customerPointsLoad(em.fork(), file.id);
 */
export async function customerPointsLoad(
  em: EntityManager,
  customerFileId: string,
): Promise<CustomerPoints> {
  const chunks = await em.find(
    CustomerPointChunkSchema,
    { customerFile: customerFileId },
    { orderBy: { seq: 'asc' } },
  );
  const count = chunks.reduce((sum, c) => sum + c.count, 0);
  const lon = new Float64Array(count);
  const lat = new Float64Array(count);
  const w = new Float64Array(count);
  let at = 0;
  for (const chunk of chunks) {
    const part = customerPointsUnpack(chunk.data);
    if (part.count !== chunk.count)
      throw new Error(
        `customer point chunk ${chunk.seq} of file ${customerFileId} holds ${part.count} points, expected ${chunk.count}`,
      );
    lon.set(part.lon, at);
    lat.set(part.lat, at);
    w.set(part.w, at);
    at += part.count;
    // Chunks are large and read once: free them from the identity map as we go.
    em.getUnitOfWork().unsetIdentity(chunk);
  }
  return { lon, lat, w, count };
}

import { EntitySchema } from '@mikro-orm/core';
import type { CustomerFile } from './customer-file.entity.js';

/** Most points in one chunk row. */
export const CUSTOMER_POINT_CHUNK_SIZE = 65_536;

/** Point flags, one byte per point. */
export const POINT_FLAG_OUTLIER = 1;
export const POINT_FLAG_DUPLICATE = 2;

/**
 * Up to 65,536 accepted customer points of one file, packed: `data` is a little-endian Float64Array
 * [lon₀…lonₙ₋₁, lat₀…latₙ₋₁, w₀…wₙ₋₁] (degrees WGS84, weight), `flags` one byte per point.
 */
export interface CustomerPointChunk {
  id: string;
  customerFile: CustomerFile;
  seq: number;
  count: number;
  data: Buffer;
  flags: Buffer;
}

export const CustomerPointChunkSchema = new EntitySchema<CustomerPointChunk>({
  name: 'CustomerPointChunk',
  tableName: 'customer_point_chunks',
  uniques: [{ properties: ['customerFile', 'seq'] }],
  properties: {
    id: { type: 'string', primary: true, length: 36 },
    customerFile: { kind: 'm:1', entity: 'CustomerFile', deleteRule: 'cascade' },
    seq: { type: 'integer' },
    count: { type: 'integer' },
    data: { type: 'blob' },
    flags: { type: 'blob' },
  },
});

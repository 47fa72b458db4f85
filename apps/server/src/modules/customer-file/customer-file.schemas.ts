import { z } from 'zod';
import { WEIGHT_KINDS } from './customer-file.entity.js';

const columnName = z
  .string({ message: 'must be a column name of the file' })
  .min(1, 'must be a column name of the file');

export const customerFileImportSchema = z.object({
  mapping: z.object(
    { lon: columnName, lat: columnName, weight: columnName.optional() },
    { message: "must be an object { lon, lat, weight? } naming the file's columns" },
  ),
  weightKind: z.enum(WEIGHT_KINDS, { message: `must be one of ${WEIGHT_KINDS.join(', ')}` }),
  weightLabel: z
    .string({ message: 'must be text' })
    .trim()
    .min(1, 'must not be empty')
    .max(120, 'must be at most 120 characters')
    .optional(),
  excludeFlagged: z.boolean({ message: 'must be true or false' }).optional(),
});

export const customerFileAggregateSchema = z.object({
  zoom: z.coerce
    .number({ message: 'must be a map zoom level 0–22' })
    .int('must be a whole zoom level 0–22')
    .min(0, 'must be a map zoom level 0–22')
    .max(22, 'must be a map zoom level 0–22'),
});

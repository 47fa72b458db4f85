import { KERNEL_NAMES, BANDWIDTH_RULES } from '@demandscape/core';
import { z } from 'zod';

const lonLat = z.tuple([
  z.number({ message: 'longitude must be a number' }).min(-180, 'longitude must be within ±180°').max(180, 'longitude must be within ±180°'),
  z.number({ message: 'latitude must be a number' }).min(-90, 'latitude must be within ±90°').max(90, 'latitude must be within ±90°'),
]);
const ring = z.array(lonLat, { message: 'a ring must be a list of [lon, lat] positions' }).min(4, 'a ring needs at least 4 positions (a closed triangle)');
const polygonCoords = z.array(ring).min(1, 'a polygon needs an outer ring');

const studyAreaSchema = z.discriminatedUnion(
  'type',
  [
    z.object({ type: z.literal('extent') }),
    z.object({
      type: z.literal('polygon'),
      geometry: z.discriminatedUnion(
        'type',
        [
          z.object({ type: z.literal('Polygon'), coordinates: polygonCoords }),
          z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(polygonCoords).min(1, 'a MultiPolygon needs at least one polygon') }),
        ],
        { message: 'geometry must be a GeoJSON Polygon or MultiPolygon in lon/lat' },
      ),
    }),
  ],
  { message: "studyArea must be { type: 'extent' } or { type: 'polygon', geometry }" },
);

const bandwidthSchema = z.discriminatedUnion(
  'mode',
  [
    z.object({ mode: z.literal('rule'), rule: z.enum(BANDWIDTH_RULES as [string, ...string[]], { message: `rule must be one of ${BANDWIDTH_RULES.join(', ')}` }) }),
    z.object({
      mode: z.literal('value'),
      value: z
        .number({ message: 'value must be a number of metres' })
        .positive('value must be a positive number of metres')
        .max(200_000, 'value must be at most 200,000 m (200 km)'),
    }),
  ],
  { message: "bandwidth must be { mode: 'rule', rule } or { mode: 'value', value } (metres)" },
);

/** Everything that shapes a surface (stored on the run as `params`). */
export const surfaceParamsSchema = z.object({
  kernel: z.enum(KERNEL_NAMES as [string, ...string[]], { message: `kernel must be one of ${KERNEL_NAMES.join(', ')}` }).default('quartic'),
  bandwidth: bandwidthSchema.default({ mode: 'rule', rule: 'normal-reference' }),
  cellSize: z.number({ message: 'cellSize must be a number of metres' }).min(1, 'cellSize must be at least 1 m').max(100_000, 'cellSize must be at most 100,000 m').optional(),
  studyArea: studyAreaSchema.default({ type: 'extent' }),
  edgeCorrection: z.boolean({ message: 'edgeCorrection must be true or false' }).default(false),
  adaptive: z.boolean({ message: 'adaptive must be true or false' }).default(false),
  unit: z.enum(['km2', 'sqmi'], { message: 'unit must be km2 or sqmi' }).default('km2'),
  method: z.enum(['auto', 'exact', 'binned'], { message: 'method must be auto, exact or binned' }).default('auto'),
});
export type SurfaceParams = z.infer<typeof surfaceParamsSchema>;

export const surfaceCreateSchema = surfaceParamsSchema.extend({
  customerFileId: z.string({ message: 'customerFileId is required' }).min(1, 'customerFileId is required').max(64),
  name: z.string({ message: 'name must be text' }).trim().min(1, 'name must not be empty').max(120, 'name must be at most 120 characters').optional(),
});
export type SurfaceCreateInput = z.infer<typeof surfaceCreateSchema>;

export const webRasterQuerySchema = z.object({
  maxSize: z.coerce.number({ message: 'maxSize must be a whole number' }).int('maxSize must be a whole number').min(16, 'maxSize must be between 16 and 4096').max(4096, 'maxSize must be between 16 and 4096').default(1024),
});

export const valueQuerySchema = z.object({
  lon: z.coerce.number({ message: 'lon must be a number' }).min(-180, 'lon must be within ±180').max(180, 'lon must be within ±180'),
  lat: z.coerce.number({ message: 'lat must be a number' }).min(-90, 'lat must be within ±90').max(90, 'lat must be within ±90'),
});

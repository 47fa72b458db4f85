import { z } from 'zod';

/** Largest ring radius: 50 km (in miles 50 / 1.609344 ≈ 31.07 mi). */
export const RING_RADIUS_MAX_M = 50_000;
const METRES = { km: 1000, mi: 1609.344 } as const;

const MEASURES = ['netNew', 'captured', 'shareOfTotal', 'cannibalization'] as const;
const MEASURE_MESSAGE = 'measure must be netNew, captured, shareOfTotal, cannibalization or ring:k (k = 0-based index into radii)';

/** PUT …/scoring-settings body. Ranges: α 0.1–5, β 0.5–5, 1–5 ascending radii ≤ 50 km, ring measure within the radii. */
export const scoringSettingsInputSchema = z
  .object({
    alpha: z.number({ message: 'alpha must be a number (Huff attractiveness exponent, 0.1–5; 1 is the usual start)' }).min(0.1, 'alpha must be at least 0.1').max(5, 'alpha must be at most 5'),
    beta: z.number({ message: 'beta must be a number (Huff distance decay, 0.5–5; 2 is the usual start)' }).min(0.5, 'beta must be at least 0.5').max(5, 'beta must be at most 5'),
    radiusUnit: z.enum(['km', 'mi'], { message: 'radiusUnit must be km or mi' }),
    radii: z
      .array(z.number({ message: 'each radius must be a number' }).positive('each radius must be greater than 0'), { message: 'radii must be a list of 1–5 numbers' })
      .min(1, 'give at least one ring radius')
      .max(5, 'give at most 5 ring radii'),
    measure: z
      .string({ message: MEASURE_MESSAGE })
      .refine((m) => (MEASURES as readonly string[]).includes(m) || /^ring:\d+$/.test(m), { message: MEASURE_MESSAGE }),
    minDistanceM: z
      .number({ message: 'minDistanceM must be a number of metres, or null for half a cell' })
      .min(1, 'minDistanceM must be at least 1 m (or null for half a cell)')
      .max(5000, 'minDistanceM must be at most 5,000 m (or null for half a cell)')
      .nullable()
      .default(null),
  })
  .superRefine((v, ctx) => {
    v.radii.forEach((r, k) => {
      if (k > 0 && !(r > v.radii[k - 1])) {
        ctx.addIssue({ code: 'custom', path: ['radii', k], message: `radii must be in ascending order without repeats (${r} follows ${v.radii[k - 1]})` });
      }
      if (r * METRES[v.radiusUnit] > RING_RADIUS_MAX_M + 1e-6) {
        const max = v.radiusUnit === 'km' ? '50 km' : '31.07 mi (50 km)';
        ctx.addIssue({ code: 'custom', path: ['radii', k], message: `ring radius ${r} ${v.radiusUnit} is larger than ${max}` });
      }
    });
    const ring = /^ring:(\d+)$/.exec(v.measure);
    if (ring && Number(ring[1]) >= v.radii.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['measure'],
        message: `measure ${v.measure} points at ring #${Number(ring[1]) + 1}, but there ${v.radii.length === 1 ? 'is 1 radius' : `are ${v.radii.length} radii`}; use ring:0 … ring:${v.radii.length - 1}`,
      });
    }
  });
export type ScoringSettingsInput = z.infer<typeof scoringSettingsInputSchema>;

/**
 * Ring radii in metres.
 * @param radii radii in `unit`
 * @param unit km or mi (1 mi = 1,609.344 m exactly, NIST SP 811)
 * @returns metres
 * @example
 * ringRadiiMetres([1, 3], 'mi'); // [1609.344, 4828.032]
 */
export function ringRadiiMetres(radii: readonly number[], unit: 'km' | 'mi'): number[] {
  return radii.map((r) => r * METRES[unit]);
}

/** POST …/scoring-runs body. */
export const scoringRunCreateSchema = z.object({
  surfaceId: z.string({ message: 'surfaceId is required (a succeeded surface of this workspace)' }).min(1, 'surfaceId is required').max(64),
  name: z.string({ message: 'name must be text' }).trim().min(1, 'name must not be empty').max(120, 'name must be at most 120 characters').optional(),
});

/** POST …/scoring-runs/:runId/sets body. */
export const siteSetCreateSchema = z.object({
  siteIds: z
    .array(z.string({ message: 'each site id must be text' }).min(1).max(64), { message: 'siteIds must be a list of candidate site ids' })
    .min(2, 'choose at least 2 candidates to open together')
    .max(20, 'choose at most 20 candidates to open together'),
  name: z.string({ message: 'name must be text' }).trim().min(1, 'name must not be empty').max(120, 'name must be at most 120 characters').optional(),
});

import { z } from 'zod';
import { CREDIT_PACK_IDS, SEATS_MAX } from './billing-plans.js';

const seatsSchema = z
  .number({ message: 'must be a whole number of seats' })
  .int('must be a whole number of seats')
  .min(1, 'must be at least 1')
  .max(SEATS_MAX, `must be at most ${SEATS_MAX}`);

export const checkoutSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('credits'), pack: z.enum(CREDIT_PACK_IDS, { message: `must be one of ${CREDIT_PACK_IDS.join(', ')}` }) }),
    z.object({ kind: z.literal('seats'), seats: seatsSchema }),
  ],
  { message: "kind must be 'credits' (with pack) or 'seats' (with seats)" },
);

export const seatsChangeSchema = z.object({ seats: seatsSchema });

export const ledgerQuerySchema = z.object({
  limit: z.coerce.number({ message: 'must be a whole number' }).int('must be a whole number').min(1, 'must be between 1 and 200').max(200, 'must be between 1 and 200').default(50),
  before: z.coerce.number({ message: 'must be a ledger entry id' }).int('must be a ledger entry id').positive('must be a ledger entry id').optional(),
});

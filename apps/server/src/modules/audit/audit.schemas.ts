import { z } from 'zod';
import { AUDIT_ACTIONS } from './audit-event.entity.js';

export const auditQuerySchema = z.object({
  limit: z.coerce.number({ message: 'must be a whole number' }).int('must be a whole number').min(1, 'must be between 1 and 200').max(200, 'must be between 1 and 200').default(50),
  before: z.coerce.number({ message: 'must be an event id' }).int('must be an event id').positive('must be an event id').optional(),
  action: z.enum(AUDIT_ACTIONS, { message: `must be one of ${AUDIT_ACTIONS.join(', ')}` }).optional(),
});

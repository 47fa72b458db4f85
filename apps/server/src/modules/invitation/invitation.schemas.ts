import { z } from 'zod';
import { ROLES } from '../organization/membership.entity.js';

export const invitationCreateSchema = z.object({
  email: z.string({ message: 'is required' }).trim().toLowerCase().pipe(z.email({ message: 'must be an e-mail address such as name@company.example' })),
  role: z.enum(ROLES, { message: `must be one of ${ROLES.join(', ')}` }),
});

export const invitationAcceptSchema = z.object({
  token: z.string({ message: 'is required' }).min(20, 'is not an invitation token (copy the whole link from the e-mail)').max(200, 'is not an invitation token'),
});

import { z } from 'zod';
import { ROLES } from './membership.entity.js';

export const organizationNameSchema = z.object({
  name: z.string({ message: 'is required' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters'),
});

export const memberRoleSchema = z.object({
  role: z.enum(ROLES, { message: `must be one of ${ROLES.join(', ')}` }),
});

import { z } from 'zod';

export const organizationNameSchema = z.object({
  name: z.string({ message: 'is required' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters'),
});

import { z } from 'zod';
import { nameField, newPasswordField } from '../auth/auth.schemas.js';

export const meUpdateSchema = z.object({ name: nameField });
export const passwordChangeSchema = z.object({
  currentPassword: z.string({ message: 'is required' }).max(200),
  newPassword: newPasswordField,
});

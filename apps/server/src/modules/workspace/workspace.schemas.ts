import { z } from 'zod';

const nameField = z.string({ message: 'is required' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters');
const descriptionField = z.string({ message: 'must be text' }).trim().max(2000, 'must be at most 2000 characters');

export const workspaceCreateSchema = z.object({ name: nameField, description: descriptionField.optional() });
export const workspaceUpdateSchema = z
  .object({ name: nameField.optional(), description: descriptionField.optional() })
  .refine((v) => v.name !== undefined || v.description !== undefined, { message: 'send at least one of name or description' });

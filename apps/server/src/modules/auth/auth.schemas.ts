import { z } from 'zod';

/** E-mail addresses are trimmed and lower-cased before use. */
export const emailField = z
  .string({ message: 'is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'must be an e-mail address like name@example.com' }).max(254, 'must be at most 254 characters'));

/** New passwords: at least 10 characters (and at most 200, to bound hashing work). */
export const newPasswordField = z
  .string({ message: 'is required' })
  .min(10, 'must be at least 10 characters')
  .max(200, 'must be at most 200 characters');

/** Display names: 1–120 characters after trimming. */
export const nameField = z.string({ message: 'is required' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters');

export const signUpSchema = z.object({ email: emailField, password: newPasswordField, name: nameField });
export const signInSchema = z.object({ email: emailField, password: z.string({ message: 'is required' }).min(1, 'is required').max(200) });
export const forgotPasswordSchema = z.object({ email: emailField });
export const resetPasswordSchema = z.object({ token: z.string({ message: 'is required' }).min(1, 'is required').max(200), password: newPasswordField });
export const verifyEmailSchema = z.object({ token: z.string({ message: 'is required' }).min(1, 'is required').max(200) });

import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { PASSWORD_MIN_LENGTH } from './sign-up';

export const resetPasswordInputSchema = z
  .object({
    password: z.string().min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`),
    confirmPassword: z.string().min(1, 'Type the password again.'),
  })
  .refine((input) => input.password === input.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two passwords differ; type the same password twice.',
  });

export type ResetPasswordInput = z.infer<typeof resetPasswordInputSchema> & { token: string };

/**
 * Sets a new password with the one-use token from the reset e-mail.
 * @param input token and new password
 * @returns nothing
 * @example await resetPassword({ token, password: 'a new long password', confirmPassword: 'a new long password' });
 */
export async function resetPassword({ token, password }: ResetPasswordInput): Promise<void> {
  await api.post<void>('/auth/reset-password', { token, password });
}

/**
 * Mutation for the reset-password form.
 * @param config extra mutation options
 * @returns the mutation
 * @example useResetPassword({ onSuccess: () => setDone(true) })
 */
export function useResetPassword(config: MutationConfig<ResetPasswordInput, void> = {}) {
  return useMutation({ meta: { errorsShownInline: true }, ...config, mutationFn: resetPassword });
}

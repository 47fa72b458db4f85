import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

const PASSWORD_MIN_LENGTH = 10;

export const changePasswordInputSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password.'),
    newPassword: z.string().min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`),
    confirmPassword: z.string().min(1, 'Type the new password again.'),
  })
  .refine((input) => input.newPassword === input.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two new passwords differ; type the same password twice.',
  })
  .refine((input) => input.newPassword !== input.currentPassword, {
    path: ['newPassword'],
    message: 'Choose a password different from the current one.',
  });

export type ChangePasswordInput = z.infer<typeof changePasswordInputSchema>;

/**
 * Changes the signed-in user's password.
 * @param input current password, new password and its confirmation (kept in the browser)
 * @returns nothing
 * @example await changePassword({ currentPassword, newPassword, confirmPassword: newPassword });
 */
export async function changePassword({ currentPassword, newPassword }: ChangePasswordInput): Promise<void> {
  await api.post<void>('/me/password', { currentPassword, newPassword });
}

/**
 * Mutation for the change-password form.
 * @param config extra mutation options
 * @returns the mutation
 * @example useChangePassword({ onSuccess: () => form.reset() })
 */
export function useChangePassword(config: MutationConfig<ChangePasswordInput, void> = {}) {
  return useMutation({ meta: { errorsShownInline: true }, ...config, mutationFn: changePassword });
}

import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

export const forgotPasswordInputSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address.').email('Enter an e-mail address like name@example.com.'),
});

export type ForgotPasswordInput = z.infer<typeof forgotPasswordInputSchema>;

/**
 * Asks for a password-reset link; the server answers the same whether or not the account exists.
 * @param input the e-mail address
 * @returns nothing
 * @example await requestPasswordReset({ email: 'ada@larchloaf.test' });
 */
export async function requestPasswordReset(input: ForgotPasswordInput): Promise<void> {
  await api.post<void>('/auth/forgot-password', input);
}

/**
 * Mutation for the forgot-password form.
 * @param config extra mutation options
 * @returns the mutation
 * @example useRequestPasswordReset().mutate({ email })
 */
export function useRequestPasswordReset(config: MutationConfig<ForgotPasswordInput, void> = {}) {
  return useMutation({ meta: { errorsShownInline: true }, ...config, mutationFn: requestPasswordReset });
}

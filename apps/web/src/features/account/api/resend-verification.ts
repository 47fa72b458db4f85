import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Sends the signed-in user a new e-mail verification link.
 * @returns nothing
 * @example await resendVerification();
 */
export async function resendVerification(): Promise<void> {
  await api.post<void>('/auth/resend-verification');
}

/**
 * Mutation for the "send a new link" button.
 * @param config extra mutation options
 * @returns the mutation
 * @example useResendVerification().mutate()
 */
export function useResendVerification(config: MutationConfig<void, void> = {}) {
  return useMutation({ ...config, mutationFn: resendVerification });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Confirms an e-mail address with the token from the verification link.
 * @param token the `token` query parameter
 * @returns nothing
 * @example await verifyEmail(new URLSearchParams(location.search).get('token')!);
 */
export async function verifyEmail(token: string): Promise<void> {
  await api.post<void>('/auth/verify-email', { token });
}

/**
 * Mutation for the verify-email page; refreshes the session so "verified" shows at once.
 * @param config extra mutation options
 * @returns the mutation
 * @example useVerifyEmail().mutate(token)
 */
export function useVerifyEmail(config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: verifyEmail,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['me'], refetchType: 'all' });
      await config.onSuccess?.(...args);
    },
  });
}

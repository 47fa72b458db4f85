import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, resetCsrfToken } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Ends the session.
 * @returns nothing
 * @example await signOut();
 */
export async function signOut(): Promise<void> {
  await api.post<void>('/auth/sign-out');
}

/**
 * Sign-out mutation: forgets the CSRF token and every cached query, then marks the session empty.
 * @param config extra mutation options
 * @returns the mutation
 * @example useSignOut({ onSuccess: () => navigate('/sign-in') }).mutate()
 */
export function useSignOut(config: MutationConfig<void, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    ...config,
    mutationFn: signOut,
    onSuccess: async (...args) => {
      resetCsrfToken();
      queryClient.clear();
      queryClient.setQueryData(['me'], null);
      await config.onSuccess?.(...args);
    },
  });
}

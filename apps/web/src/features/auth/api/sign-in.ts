import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, resetCsrfToken } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { signedOutHereReset } from './sign-out';
import type { User } from '../../../types/api';

export const signInInputSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address.').email('Enter an e-mail address like name@example.com.'),
  password: z.string().min(1, 'Enter your password.'),
});

export type SignInInput = z.infer<typeof signInInputSchema>;

/**
 * Signs in with e-mail and password.
 * @param input e-mail and password
 * @returns the user
 * @example await signIn({ email: 'ada@larchloaf.test', password: 'correct horse battery' });
 */
export async function signIn(input: SignInInput): Promise<{ user: User }> {
  return api.post<{ user: User }>('/auth/sign-in', input);
}

/**
 * Sign-in mutation: renews the CSRF token (it belongs to the session) and reloads the session.
 * @param config extra mutation options
 * @returns the mutation
 * @example const signInMutation = useSignIn({ onSuccess: () => navigate(redirectTo) });
 */
export function useSignIn(config: MutationConfig<SignInInput, { user: User }> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: signIn,
    onSuccess: async (...args) => {
      resetCsrfToken();
      signedOutHereReset();
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'me' });
      await queryClient.invalidateQueries({ queryKey: ['me'], refetchType: 'all' });
      await config.onSuccess?.(...args);
    },
  });
}

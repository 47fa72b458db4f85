import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, resetCsrfToken } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import { signedOutHereReset } from './sign-out';
import type { User } from '../../../types/api';

export const PASSWORD_MIN_LENGTH = 10;

export const signUpInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter your name as teammates should see it.').max(120, 'Use at most 120 characters.'),
    email: z.string().trim().min(1, 'Enter your e-mail address.').email('Enter an e-mail address like name@example.com.'),
    password: z.string().min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`),
    confirmPassword: z.string().min(1, 'Type the password again.'),
  })
  .refine((input) => input.password === input.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two passwords differ; type the same password twice.',
  });

export type SignUpInput = z.infer<typeof signUpInputSchema>;

/**
 * Creates an account and signs in; the server e-mails a verification link.
 * @param input name, e-mail and password (the confirmation stays in the browser)
 * @returns the new user
 * @example await signUp({ name: 'Ada', email: 'ada@larchloaf.test', password: 'a long password', confirmPassword: 'a long password' });
 */
export async function signUp({ name, email, password }: SignUpInput): Promise<{ user: User }> {
  return api.post<{ user: User }>('/auth/sign-up', { name, email, password });
}

/**
 * Sign-up mutation: renews the CSRF token and loads the new session.
 * @param config extra mutation options
 * @returns the mutation
 * @example const signUpMutation = useSignUp({ onSuccess: () => navigate('/welcome') });
 */
export function useSignUp(config: MutationConfig<SignUpInput, { user: User }> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: signUp,
    onSuccess: async (...args) => {
      resetCsrfToken();
      signedOutHereReset();
      await queryClient.invalidateQueries({ queryKey: ['me'], refetchType: 'all' });
      await config.onSuccess?.(...args);
    },
  });
}

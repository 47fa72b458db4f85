import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, resetCsrfToken } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

let signedOutInThisTab = false;

/**
 * Whether the session ended because the user signed out in this tab (then the sign-in page needs no
 * return path), as opposed to expiring while a page was open.
 * @returns true after a sign-out here, until the next sign-in
 * @example paths.auth.signIn.getHref(signedOutHere() ? null : location.pathname)
 */
export function signedOutHere(): boolean {
  return signedOutInThisTab;
}

/**
 * Clears the "signed out here" mark; called when a new session starts.
 * @returns nothing
 * @example signedOutHereReset();
 */
export function signedOutHereReset(): void {
  signedOutInThisTab = false;
}

/**
 * Ends the session.
 * @returns nothing
 * @example await signOut();
 */
export async function signOut(): Promise<void> {
  await api.post<void>('/auth/sign-out');
}

/**
 * Sign-out mutation: forgets the CSRF token and every cached query and marks the session empty; the
 * caller then navigates to the sign-in page (the route guard would too, without a return path).
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
      signedOutInThisTab = true;
      resetCsrfToken();
      queryClient.clear();
      queryClient.setQueryData(['me'], null);
      await config.onSuccess?.(...args);
    },
  });
}

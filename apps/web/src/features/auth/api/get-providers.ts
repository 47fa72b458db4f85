import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AuthProviders } from '../../../types/api';

/**
 * The sign-in providers this server offers besides e-mail and password.
 * @returns e.g. `{ google: { enabled: true, label: 'Continue with Google' } }`
 * @example const { google } = await getProviders();
 */
export async function getProviders(): Promise<AuthProviders> {
  return api.get<AuthProviders>('/auth/providers');
}

/**
 * Query options for the providers list (it rarely changes, so it is kept for the session).
 * @returns options keyed `['auth-providers']`
 * @example queryClient.prefetchQuery(getProvidersQueryOptions())
 */
export function getProvidersQueryOptions() {
  return queryOptions({ queryKey: ['auth-providers'], queryFn: getProviders, staleTime: Infinity });
}

/**
 * The providers list in a component.
 * @returns the query result
 * @example const providers = useProviders();
 */
export function useProviders() {
  return useQuery(getProvidersQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import type { Me } from '../../../types/api';

/**
 * The signed-in user and their memberships; `null` when nobody is signed in (401 is a state here, not an error).
 * @returns the session, or null
 * @example const me = await getMe(); if (!me) redirect('/sign-in');
 */
export async function getMe(): Promise<Me | null> {
  try {
    return await api.get<Me>('/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

/**
 * Query options for the session, shared by the route guard's loader and components.
 * @returns options keyed `['me']`
 * @example queryClient.ensureQueryData(getMeQueryOptions())
 */
export function getMeQueryOptions() {
  return queryOptions({ queryKey: ['me'], queryFn: getMe });
}

/**
 * The session in a component.
 * @returns the query result; `data` is null when signed out
 * @example const { data: me } = useMe();
 */
export function useMe() {
  return useQuery(getMeQueryOptions());
}

import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { safeRedirectPath } from '../../../config/paths';
import { getMeQueryOptions } from '../../../features/auth/api/get-me';
import { getProvidersQueryOptions } from '../../../features/auth/api/get-providers';

/**
 * Loader for the sign-in and sign-up pages: someone already signed in goes straight on.
 * @param queryClient the app's query client
 * @returns the loader
 * @example export const clientLoader = redirectIfSignedIn;
 */
export function redirectIfSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const url = new URL(request.url);
    void queryClient.prefetchQuery(getProvidersQueryOptions());
    const me = await queryClient.ensureQueryData(getMeQueryOptions()).catch(() => null);
    if (me) throw redirect(safeRedirectPath(url.searchParams.get('redirectTo')));
    return null;
  };
}

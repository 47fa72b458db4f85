import { MutationCache, QueryCache, QueryClient, type UseMutationOptions } from '@tanstack/react-query';
import { notify } from '../components/notifications/notifications-store';
import { ApiError, errorMessage } from './api-error';

declare module '@tanstack/react-query' {
  interface Register {
    defaultError: Error;
    mutationMeta: { /** The form shows this mutation's errors itself (on fields or in an alert). */ errorsShownInline?: boolean };
  }
}

export type MutationConfig<TVariables, TData = unknown> = Omit<
  UseMutationOptions<TData, Error, TVariables>,
  'mutationFn'
>;

/**
 * Builds the app's query client. Failed mutations become a notification unless their form shows
 * the error itself; a 401 on any query refreshes the session query so the route guard can act.
 * @returns a configured QueryClient
 * @example const queryClient = queryClientCreate();
 */
export function queryClientCreate(): QueryClient {
  const client: QueryClient = new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) =>
          !(error instanceof ApiError && error.status >= 400 && error.status < 500) && failureCount < 2,
      },
    },
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (error instanceof ApiError && error.status === 401 && query.queryKey[0] !== 'me') {
          void client.invalidateQueries({ queryKey: ['me'] });
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (mutation.meta?.errorsShownInline) return;
        notify({ tone: 'danger', title: 'That did not work', message: errorMessage(error) });
      },
    }),
  });
  return client;
}

import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Notifications } from '../components/notifications/notifications';

/**
 * Everything the app needs around its routes: the query cache and the notification stack.
 * @param props the query client and the app
 * @returns the providers
 * @example <AppProvider queryClient={queryClient}><AppRouter /></AppProvider>
 */
export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      {children}
      <Notifications />
    </QueryClientProvider>
  );
}

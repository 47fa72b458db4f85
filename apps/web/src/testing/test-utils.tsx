import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router';
import { AppProvider } from '../app/provider';
import { appRoutes } from '../app/router';

/**
 * A query client for one test: no retries, nothing kept between tests.
 * @returns the client
 * @example const queryClient = testQueryClient();
 */
export function testQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } } });
}

/**
 * Renders one component inside the providers and a memory router, at a given path.
 * @param ui the component
 * @param options the URL to start at, the route pattern, extra routes to navigate to
 * @returns Testing Library's render result plus the router
 * @example renderWithProviders(<SignInForm onSuccess={fn} />)
 */
export function renderWithProviders(
  ui: ReactElement,
  options: { url?: string; path?: string; routes?: RouteObject[] } = {},
) {
  const queryClient = testQueryClient();
  const router = createMemoryRouter([{ path: options.path ?? '/', element: ui }, ...(options.routes ?? [])], {
    initialEntries: [options.url ?? '/'],
  });
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, router, queryClient };
}

/**
 * Renders the whole app (real routes, loaders and guards) at a URL.
 * @param url where to start
 * @returns Testing Library's render result plus the router
 * @example const { router } = renderApp('/orgs/org_1/workspaces');
 */
export function renderApp(url: string) {
  const queryClient = testQueryClient();
  const router = createMemoryRouter(appRoutes(queryClient), { initialEntries: [url] });
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, router, queryClient };
}

import { Spinner } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { LoaderFunction, RouteObject } from 'react-router';
import { RouteError } from '../components/errors/route-error';
import { paths } from '../config/paths';

type RouteModule = {
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
  default: ComponentType;
};

// Route modules export a loader factory so loaders share the app's query cache with components.
const convert = (queryClient: QueryClient) => (module: RouteModule) => ({
  loader: module.clientLoader?.(queryClient),
  Component: module.default,
});

function PageLoading() {
  return <Spinner size="lg" label="Loading Demandscape" className="flex min-h-dvh items-center justify-center" />;
}

/**
 * The app's routes: public sign-in pages, the guarded app (home redirect, welcome, account) and the
 * organization pages, each lazy-loaded with its own error boundary, plus a 404.
 * @param queryClient the app's query client, handed to every loader
 * @returns route objects for `createBrowserRouter` (or `createMemoryRouter` in tests)
 * @example createBrowserRouter(appRoutes(queryClient))
 */
export function appRoutes(queryClient: QueryClient): RouteObject[] {
  const load = convert(queryClient);
  return [
    {
      HydrateFallback: PageLoading,
      ErrorBoundary: RouteError,
      children: [
        { path: paths.auth.signIn.path, lazy: () => import('./routes/auth/sign-in').then(load), ErrorBoundary: RouteError },
        { path: paths.auth.signUp.path, lazy: () => import('./routes/auth/sign-up').then(load), ErrorBoundary: RouteError },
        {
          path: paths.auth.forgotPassword.path,
          lazy: () => import('./routes/auth/forgot-password').then(load),
          ErrorBoundary: RouteError,
        },
        {
          path: paths.auth.resetPassword.path,
          lazy: () => import('./routes/auth/reset-password').then(load),
          ErrorBoundary: RouteError,
        },
        {
          path: paths.auth.verifyEmail.path,
          lazy: () => import('./routes/auth/verify-email').then(load),
          ErrorBoundary: RouteError,
        },
        {
          path: paths.invitationAccept.path,
          lazy: () => import('./routes/invitations/accept').then(load),
          ErrorBoundary: RouteError,
        },
        {
          path: paths.home.path,
          lazy: () => import('./routes/app/root').then(load),
          ErrorBoundary: RouteError,
          children: [
            { index: true, lazy: () => import('./routes/app/home').then(load), ErrorBoundary: RouteError },
            { path: paths.welcome.path, lazy: () => import('./routes/app/welcome').then(load), ErrorBoundary: RouteError },
            { path: paths.account.path, lazy: () => import('./routes/app/account').then(load), ErrorBoundary: RouteError },
            {
              path: paths.org.root.path,
              lazy: () => import('./routes/org/org-root').then(load),
              ErrorBoundary: RouteError,
              children: [
                { index: true, lazy: () => import('./routes/org/org-index').then(load) },
                { path: paths.org.workspaces.path, lazy: () => import('./routes/org/workspaces').then(load), ErrorBoundary: RouteError },
                { path: paths.org.workspace.path, lazy: () => import('./routes/org/workspace').then(load), ErrorBoundary: RouteError },
                { path: paths.org.members.path, lazy: () => import('./routes/org/members').then(load), ErrorBoundary: RouteError },
                { path: paths.org.auditLog.path, lazy: () => import('./routes/org/audit-log').then(load), ErrorBoundary: RouteError },
                { path: paths.org.billing.path, lazy: () => import('./routes/org/billing').then(load), ErrorBoundary: RouteError },
                { path: paths.org.shortlists.path, lazy: () => import('./routes/org/shortlists').then(load), ErrorBoundary: RouteError },
                { path: paths.org.shortlist.path, lazy: () => import('./routes/org/shortlist').then(load), ErrorBoundary: RouteError },
              ],
            },
          ],
        },
        { path: '*', lazy: () => import('./routes/not-found').then(load) },
      ],
    },
  ];
}

import { Alert, Button, Spinner } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, redirect, useLocation, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { getMeQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { signedOutHere } from '../../../features/auth/api/sign-out';
import { errorMessage } from '../../../lib/api-error';
import { lastOrganizationId } from '../../../lib/last-organization';
import { AppShell } from '../../layouts/app-shell';

/**
 * The route guard: signed-out visitors go to sign-in with the path they asked for.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: '/', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(getMeQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(paths.auth.signIn.getHref(url.pathname + url.search));
    }
    return null;
  };

/** The signed-in part of the app inside its shell. */
export default function AppRoot() {
  const me = useMe();
  const location = useLocation();
  const { orgId } = useParams();

  if (me.data === null) {
    // Signed out here: a plain sign-in page. Session ended otherwise (expiry, another tab): come back after.
    const returnTo = signedOutHere() ? null : location.pathname + location.search;
    return <Navigate to={paths.auth.signIn.getHref(returnTo)} replace />;
  }
  if (me.isError && !me.data) {
    return (
      <main className="mx-auto max-w-xl px-6 py-16">
        <Alert tone="danger" title="Could not load your session">
          {errorMessage(me.error)}
        </Alert>
        <Button variant="secondary" className="mt-4" onClick={() => void me.refetch()}>
          Try again
        </Button>
      </main>
    );
  }
  if (!me.data) return <Spinner size="lg" label="Loading your session" className="flex min-h-dvh items-center justify-center" />;

  const shellOrgId = orgId ?? lastOrganizationId() ?? me.data.memberships[0]?.organization.id ?? null;
  return (
    <AppShell me={me.data} orgId={shellOrgId}>
      <Outlet />
    </AppShell>
  );
}

import { Alert, Button } from '@demandscape/ui';
import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ApiError, errorMessage } from '../../lib/api-error';
import { NotFound } from './not-found';

/**
 * Error boundary for a route: not-found and forbidden answers get their own page, anything else a
 * readable message and a way to retry.
 * @returns the error view
 * @example { path: 'members', ErrorBoundary: RouteError }
 */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : error instanceof ApiError ? error.status : 0;
  if (status === 404) return <NotFound />;
  if (status === 403) {
    const message = isRouteErrorResponse(error) && typeof error.data === 'string' ? error.data : errorMessage(error);
    return <NotFound title="Not available for your role" message={message} />;
  }
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <Alert tone="danger" title="This page could not be shown">
        {isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : errorMessage(error)}
      </Alert>
      <Button variant="secondary" className="mt-4" onClick={() => window.location.reload()}>
        Reload the page
      </Button>
    </main>
  );
}

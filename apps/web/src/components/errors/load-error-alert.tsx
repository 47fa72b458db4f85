import { Alert, Button } from '@demandscape/ui';
import { errorMessage } from '../../lib/api-error';

export type LoadErrorAlertProps = {
  /** What could not be loaded, e.g. "Could not load the shortlists". */
  title: string;
  error: unknown;
  onRetry: () => unknown;
};

/**
 * A list or detail that failed to load: the server's explanation and a "Try again" link.
 * @param props the title, the error and what retries the request
 * @returns the alert
 * @example if (files.isError) return <LoadErrorAlert title="Could not load the customer files" error={files.error} onRetry={files.refetch} />;
 */
export function LoadErrorAlert({ title, error, onRetry }: LoadErrorAlertProps) {
  return (
    <Alert tone="danger" title={title}>
      {errorMessage(error)}{' '}
      <Button variant="link" onClick={() => void onRetry()}>
        Try again
      </Button>
    </Alert>
  );
}

import { Alert, Spinner } from '@demandscape/ui';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { useVerifyEmail } from '../api/verify-email';

/**
 * Confirms the e-mail address as soon as the page opens and says how it went.
 * @param props the token from the link
 * @returns progress, success or failure
 * @example <VerifyEmailStatus token={searchParams.get('token')} />
 */
export function VerifyEmailStatus({ token }: { token: string | null }) {
  const mutation = useVerifyEmail();
  const sent = useRef(false);
  const { mutate } = mutation;

  useEffect(() => {
    // One request per token, also under StrictMode's double effect run: the token is single-use.
    if (!token || sent.current) return;
    sent.current = true;
    mutate(token);
  }, [token, mutate]);

  if (!token) {
    return (
      <Alert tone="danger" title="This link is incomplete">
        Open the link from the verification e-mail exactly as it arrived. Signed in, you can send a new one from your
        account page.
      </Alert>
    );
  }
  if (mutation.isError) {
    const expired = mutation.error instanceof ApiError && mutation.error.code === 'TOKEN_INVALID';
    return (
      <Alert tone="danger" title="Could not confirm the e-mail address">
        {expired ? 'This link has expired or was already used.' : errorMessage(mutation.error)} Signed in, you can send a
        new link from your{' '}
        <Link to={paths.account.getHref()} className="font-medium text-accent underline">
          account page
        </Link>
        .
      </Alert>
    );
  }
  if (mutation.isSuccess) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="E-mail address confirmed">
          Thank you. Your address is verified.
        </Alert>
        <Link to={paths.home.getHref()} className="text-center text-sm font-medium text-accent hover:underline">
          Continue to Demandscape
        </Link>
      </div>
    );
  }
  return (
    <div role="status" className="flex items-center gap-3 text-sm text-ink-muted">
      <Spinner label="" />
      Confirming your e-mail address…
    </div>
  );
}

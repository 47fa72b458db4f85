import { Alert } from '@demandscape/ui';
import { useNavigate, useSearchParams } from 'react-router';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { safeRedirectPath } from '../../../config/paths';
import { GoogleSignIn } from '../../../features/auth/components/google-sign-in';
import { SignInForm } from '../../../features/auth/components/sign-in-form';
import { redirectIfSignedIn } from './redirect-if-signed-in';

export const clientLoader = redirectIfSignedIn;

/** The sign-in page; `?redirectTo=` brings the user back where the guard stopped them. */
export default function SignInRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = searchParams.get('redirectTo');
  return (
    <AuthLayout title="Sign in" description="Welcome back. Your studies are where you left them.">
      {searchParams.get('error') === 'google' ? (
        <Alert tone="danger" title="Google sign-in did not finish" className="mb-4">
          The sign-in was cancelled or the account could not be confirmed. Try again, or use e-mail and password.
        </Alert>
      ) : null}
      <div className="flex flex-col gap-4">
        <GoogleSignIn />
        <SignInForm redirectTo={redirectTo} onSuccess={() => navigate(safeRedirectPath(redirectTo), { replace: true })} />
      </div>
    </AuthLayout>
  );
}

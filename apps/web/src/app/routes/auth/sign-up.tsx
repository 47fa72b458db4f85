import { useNavigate, useSearchParams } from 'react-router';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { safeRedirectPath } from '../../../config/paths';
import { GoogleSignIn } from '../../../features/auth/components/google-sign-in';
import { SignUpForm } from '../../../features/auth/components/sign-up-form';
import { redirectIfSignedIn } from './redirect-if-signed-in';

export const clientLoader = redirectIfSignedIn;

/** The sign-up page. */
export default function SignUpRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = searchParams.get('redirectTo');
  return (
    <AuthLayout
      title="Create your account"
      description="Then create an organization for your team and start your first site-selection study."
    >
      <div className="flex flex-col gap-4">
        <GoogleSignIn />
        <SignUpForm redirectTo={redirectTo} onSuccess={() => navigate(safeRedirectPath(redirectTo), { replace: true })} />
      </div>
    </AuthLayout>
  );
}

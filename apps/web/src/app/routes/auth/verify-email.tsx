import { useSearchParams } from 'react-router';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { VerifyEmailStatus } from '../../../features/auth/components/verify-email-status';

/** Confirms the e-mail address with `?token=` from the e-mail; works signed in or out. */
export default function VerifyEmailRoute() {
  const [searchParams] = useSearchParams();
  return (
    <AuthLayout title="Confirm your e-mail address">
      <VerifyEmailStatus token={searchParams.get('token')} />
    </AuthLayout>
  );
}

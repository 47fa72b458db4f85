import { useSearchParams } from 'react-router';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { ResetPasswordForm } from '../../../features/auth/components/reset-password-form';

/** Chooses a new password with `?token=` from the e-mail. */
export default function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  return (
    <AuthLayout title="Choose a new password">
      <ResetPasswordForm token={searchParams.get('token')} />
    </AuthLayout>
  );
}

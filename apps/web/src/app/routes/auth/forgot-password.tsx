import { AuthLayout } from '../../../components/layouts/auth-layout';
import { ForgotPasswordForm } from '../../../features/auth/components/forgot-password-form';

/** Asks for a password-reset link. */
export default function ForgotPasswordRoute() {
  return (
    <AuthLayout title="Reset your password" description="We will e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
    </AuthLayout>
  );
}

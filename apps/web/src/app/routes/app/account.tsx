import { Spinner } from '@demandscape/ui';
import { PageHeader } from '../../../components/layouts/page-header';
import { useMe } from '../../../features/auth/api/get-me';
import { ChangePasswordForm } from '../../../features/account/components/change-password-form';
import { EmailVerificationCard } from '../../../features/account/components/email-verification-card';
import { ProfileForm } from '../../../features/account/components/profile-form';

/** The signed-in user's own settings. */
export default function AccountRoute() {
  const me = useMe();
  if (!me.data) return <Spinner label="Loading your account" className="flex justify-center p-16" />;
  return (
    <div className="mx-auto max-w-2xl">
      <PageHeader title="Account" description="Your name, e-mail address and password. They apply in every organization." />
      <div className="flex flex-col gap-6">
        <ProfileForm user={me.data.user} />
        <EmailVerificationCard user={me.data.user} />
        <ChangePasswordForm />
      </div>
    </div>
  );
}

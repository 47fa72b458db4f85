import { useNavigate, useSearchParams } from 'react-router';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { notify } from '../../../components/notifications/notifications-store';
import { paths } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { InvitationAccept } from '../../../features/invitations/components/invitation-accept';
import { roleLabels } from '../../../lib/authorization';
import { lastOrganizationRemember } from '../../../lib/last-organization';

/** `/invitations/accept?token=…`: open to everyone; accepting needs a session with the invited e-mail. */
export default function InvitationAcceptRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const token = searchParams.get('token') ?? '';
  const here = paths.invitationAccept.getHref(token);
  return (
    <AuthLayout title="Invitation" description="Join a team on Demandscape.">
      {me.isPending ? null : (
        <InvitationAccept
          token={token}
          signedInEmail={me.data?.user.email ?? null}
          signInHref={paths.auth.signIn.getHref(here)}
          signUpHref={paths.auth.signUp.getHref(here)}
          onAccepted={({ organization, role }) => {
            lastOrganizationRemember(organization.id);
            notify({ tone: 'success', title: `Welcome to ${organization.name}`, message: `You joined as ${roleLabels[role]}.` });
            navigate(paths.org.workspaces.getHref(organization.id), { replace: true });
          }}
        />
      )}
    </AuthLayout>
  );
}

import { Alert, Button, Spinner } from '@demandscape/ui';
import { Link } from 'react-router';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { roleLabels } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import { useAcceptInvitation, type AcceptInvitationResult } from '../api/accept-invitation';
import { useInvitationPreview } from '../api/get-invitation-preview';

export type InvitationAcceptProps = {
  token: string;
  /** The signed-in account's e-mail, or null when signed out. */
  signedInEmail: string | null;
  /** Where "Sign in" and "Create an account" go; both return to this page afterwards. */
  signInHref: string;
  signUpHref: string;
  onAccepted: (result: AcceptInvitationResult) => void;
};

function PreviewError({ error }: { error: unknown }) {
  const unknown = error instanceof ApiError && error.status === 404;
  return (
    <Alert tone="danger" title={unknown ? 'This invitation link does not work' : 'Could not open the invitation'}>
      {unknown
        ? 'The link is unknown, or a newer invitation replaced it. Open the most recent invitation e-mail, or ask an owner to resend it.'
        : errorMessage(error)}
    </Alert>
  );
}

/**
 * The invitation page: who invites whom to which organization with which role; signed-out visitors
 * are offered sign-in or sign-up (returning here), signed-in ones accept with one click.
 * @param props token, the signed-in e-mail, sign-in/up links and what to do after accepting
 * @returns the card
 * @example <InvitationAccept token={token} signedInEmail={me?.user.email ?? null} signInHref={…} signUpHref={…} onAccepted={go} />
 */
export function InvitationAccept({ token, signedInEmail, signInHref, signUpHref, onAccepted }: InvitationAcceptProps) {
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation({ onSuccess: onAccepted });

  if (!token) {
    return (
      <Alert tone="danger" title="This link has no invitation in it">
        Open the link from the invitation e-mail again; copy the whole address if you paste it.
      </Alert>
    );
  }
  if (preview.isPending) return <Spinner label="Opening the invitation" className="flex justify-center p-10" />;
  if (preview.isError) return <PreviewError error={preview.error} />;

  const invitation = preview.data;
  const org = invitation.organization.name;
  const role = roleLabels[invitation.role];
  const mismatch = signedInEmail !== null && signedInEmail.toLowerCase() !== invitation.email.toLowerCase();
  return (
    <div className="flex flex-col gap-4">
      <p className="text-base text-ink">
        {invitation.invitedBy ? `${invitation.invitedBy.name} invites you` : 'You are invited'} to join <strong>{org}</strong> on
        Demandscape as <strong>{role}</strong>.
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-muted">Sent to</dt>
        <dd className="text-ink">{invitation.email}</dd>
        <dt className="text-ink-muted">{invitation.status === 'expired' ? 'Expired' : 'Valid until'}</dt>
        <dd className="text-ink">{dateText(invitation.expiresAt)}</dd>
      </dl>
      {invitation.status === 'expired' ? (
        <Alert tone="caution" title="This invitation has expired">
          Ask an owner of {org} to resend it; the new e-mail has a fresh link.
        </Alert>
      ) : invitation.status === 'revoked' ? (
        <Alert tone="caution" title="This invitation was withdrawn">
          Ask an owner of {org} for a new invitation.
        </Alert>
      ) : invitation.status === 'accepted' ? (
        <Alert tone="info" title="This invitation was already accepted">
          Sign in with {invitation.email} to open {org}.
        </Alert>
      ) : signedInEmail === null ? (
        <div className="flex flex-col gap-3">
          <p className="text-sm text-ink-muted">Sign in, or create an account with {invitation.email}, to accept. You come back here afterwards.</p>
          <div className="flex flex-wrap gap-2">
            <Link to={signUpHref} className="inline-flex h-10 items-center rounded-control bg-accent px-4 text-sm font-medium text-on-accent hover:bg-accent-strong">
              Create an account
            </Link>
            <Link to={signInHref} className="inline-flex h-10 items-center rounded-control border border-line-strong px-4 text-sm font-medium text-ink hover:bg-sunken">
              Sign in
            </Link>
          </div>
        </div>
      ) : (
        <div className="flex flex-col gap-3">
          {mismatch ? (
            <Alert tone="caution" title="Signed in with another e-mail">
              You are signed in as {signedInEmail}, but this invitation is for {invitation.email}. Sign out and sign in (or create an
              account) with the invited address.
            </Alert>
          ) : null}
          {accept.isError ? <Alert tone="danger">{errorMessage(accept.error)}</Alert> : null}
          <div>
            <Button onClick={() => accept.mutate(token)} isLoading={accept.isPending}>
              Join {org}
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}

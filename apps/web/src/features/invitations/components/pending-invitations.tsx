import { Alert, Badge, Button, EmptyState, Spinner } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { roleLabels } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import { useInvitations } from '../api/get-invitations';
import { useResendInvitation } from '../api/resend-invitation';
import { useRevokeInvitation } from '../api/revoke-invitation';
import type { Invitation } from '../types';

/**
 * Open and expired invitations with their expiry, and buttons to resend (new link, 7 more days) or
 * revoke (the link stops working, the seat is free again).
 * @param props the organization
 * @returns the list, or its loading, error or empty state
 * @example <PendingInvitations orgId={orgId} />
 */
export function PendingInvitations({ orgId }: { orgId: string }) {
  const invitations = useInvitations(orgId);
  const resend = useResendInvitation(orgId);
  const revoke = useRevokeInvitation(orgId);
  const open = (invitations.data ?? []).filter((i: Invitation) => i.status === 'pending' || i.status === 'expired');

  if (invitations.isPending) return <Spinner label="Loading invitations" className="flex justify-center p-6" />;
  if (invitations.isError) {
    return (
      <div className="p-5">
        <Alert tone="danger" title="Could not load the invitations">
          {errorMessage(invitations.error)}
        </Alert>
      </div>
    );
  }
  if (open.length === 0) return <EmptyState title="No open invitations">People you invite appear here until they accept.</EmptyState>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Open invitations</caption>
        <thead className="border-b border-line text-xs text-ink-muted">
          <tr>
            <th scope="col" className="px-5 py-2.5 font-medium">E-mail</th>
            <th scope="col" className="px-5 py-2.5 font-medium">Role</th>
            <th scope="col" className="px-5 py-2.5 font-medium">Invited by</th>
            <th scope="col" className="px-5 py-2.5 font-medium">Expires</th>
            <th scope="col" className="px-5 py-2.5 font-medium"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {open.map((invitation) => (
            <tr key={invitation.id}>
              <td className="px-5 py-3 font-medium text-ink">{invitation.email}</td>
              <td className="px-5 py-3">{roleLabels[invitation.role]}</td>
              <td className="px-5 py-3 text-ink-muted">{invitation.invitedBy?.name ?? '—'}</td>
              <td className="px-5 py-3">
                {invitation.status === 'expired' ? <Badge tone="caution">Expired {dateText(invitation.expiresAt)}</Badge> : dateText(invitation.expiresAt)}
              </td>
              <td className="px-5 py-3">
                <div className="flex justify-end gap-2">
                  <Button
                    size="sm"
                    variant="secondary"
                    onClick={() => resend.mutate(invitation.id)}
                    isLoading={resend.isPending && resend.variables === invitation.id}
                    aria-label={`Resend the invitation to ${invitation.email}`}
                  >
                    Resend
                  </Button>
                  <Button
                    size="sm"
                    variant="ghost"
                    onClick={() => revoke.mutate(invitation.id)}
                    isLoading={revoke.isPending && revoke.variables === invitation.id}
                    aria-label={`Revoke the invitation to ${invitation.email}`}
                  >
                    Revoke
                  </Button>
                </div>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

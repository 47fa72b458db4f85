import { Alert, Badge, Button, Dialog, Select } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { roleLabels } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import type { Member, Role } from '../../../types/api';
import { useChangeMemberRole } from '../api/change-member-role';
import { useRemoveMember } from '../api/remove-member';

export type MemberRosterProps = {
  orgId: string;
  orgName: string;
  members: Member[];
  /** Owners may change roles and remove members; everyone else reads. */
  canManage: boolean;
  currentUserId: string | null;
};

const roles = Object.keys(roleLabels) as Role[];

/**
 * Everyone in the organization with their role; owners change roles with a select and remove
 * members after confirming. The server's refusal (e.g. LAST_OWNER) is shown above the table.
 * @param props organization, members, whether the viewer manages them, and the viewer's id
 * @returns the table with its error line and the remove confirmation
 * @example <MemberRoster orgId={orgId} orgName={name} members={members} canManage currentUserId={me.user.id} />
 */
export function MemberRoster({ orgId, orgName, members, canManage, currentUserId }: MemberRosterProps) {
  const change = useChangeMemberRole(orgId);
  const remove = useRemoveMember(orgId, { onSuccess: () => setRemoving(null) });
  const [removing, setRemoving] = useState<Member | null>(null);
  const failure = change.isError ? change.error : null;

  return (
    <>
      {failure ? (
        <div className="px-5 pt-4">
          <Alert tone="danger" title="The role was not changed">
            {errorMessage(failure)}
          </Alert>
        </div>
      ) : null}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Members of {orgName}</caption>
          <thead className="border-b border-line text-xs text-ink-muted">
            <tr>
              <th scope="col" className="px-5 py-2.5 font-medium">Name</th>
              <th scope="col" className="px-5 py-2.5 font-medium">E-mail</th>
              <th scope="col" className="px-5 py-2.5 font-medium">Role</th>
              <th scope="col" className="px-5 py-2.5 font-medium">Joined</th>
              {canManage ? <th scope="col" className="px-5 py-2.5 font-medium"><span className="sr-only">Actions</span></th> : null}
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {members.map((member) => (
              <tr key={member.userId}>
                <td className="px-5 py-3 font-medium text-ink">
                  {member.name}
                  {member.userId === currentUserId ? <span className="ml-2 text-xs font-normal text-ink-muted">(you)</span> : null}
                </td>
                <td className="px-5 py-3 text-ink-muted">{member.email}</td>
                <td className="px-5 py-3">
                  {canManage ? (
                    <Select
                      aria-label={`Role of ${member.name}`}
                      value={member.role}
                      disabled={change.isPending && change.variables?.userId === member.userId}
                      onChange={(event) => change.mutate({ userId: member.userId, role: event.target.value as Role })}
                      className="h-9 w-36"
                    >
                      {roles.map((role) => (
                        <option key={role} value={role}>
                          {roleLabels[role]}
                        </option>
                      ))}
                    </Select>
                  ) : (
                    <Badge tone={member.role === 'owner' ? 'accent' : 'neutral'}>{roleLabels[member.role]}</Badge>
                  )}
                </td>
                <td className="px-5 py-3 text-ink-muted">{dateText(member.joinedAt)}</td>
                {canManage ? (
                  <td className="px-5 py-3 text-right">
                    <Button size="sm" variant="ghost" onClick={() => { remove.reset(); setRemoving(member); }} aria-label={`Remove ${member.name}`}>
                      Remove
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Dialog open={removing !== null} onClose={() => setRemoving(null)} title={removing ? `Remove ${removing.name}?` : 'Remove member'}>
        {removing ? (
          <div className="flex flex-col gap-4">
            <p className="text-sm text-ink">
              {removing.name} ({removing.email}) loses access to {orgName} at once and their seat becomes free. Their workspaces and
              runs stay with the organization.
            </p>
            {remove.isError ? <Alert tone="danger">{errorMessage(remove.error)}</Alert> : null}
            <div className="flex justify-end gap-2">
              <Button variant="ghost" onClick={() => setRemoving(null)}>
                Keep {removing.name}
              </Button>
              <Button variant="danger" onClick={() => remove.mutate(removing.userId)} isLoading={remove.isPending}>
                Remove member
              </Button>
            </div>
          </div>
        ) : null}
      </Dialog>
    </>
  );
}

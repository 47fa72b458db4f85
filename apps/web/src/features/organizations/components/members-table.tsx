import { Alert, Badge, Card, CardHeader, EmptyState, Spinner } from '@demandscape/ui';
import type { ReactNode } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { roleLabels } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import type { Member } from '../../../types/api';
import { useMembers } from '../api/get-members';

export type MembersTableProps = {
  orgId: string;
  /** Renders the loaded members instead of the read-only table (the members page passes an editable one for owners). */
  renderMembers?: (members: Member[]) => ReactNode;
};

/**
 * Everyone in the organization with their role, read-only unless `renderMembers` supplies another view.
 * @param props the organization and an optional renderer for the loaded members
 * @returns a card with the table, or its loading, error or empty state
 * @example <MembersTable orgId={orgId} />
 */
export function MembersTable({ orgId, renderMembers }: MembersTableProps) {
  const members = useMembers(orgId);
  return (
    <Card>
      <CardHeader
        title="Members"
        description="Roles decide what each person can do: owners manage the organization, analysts build demand surfaces, planners score sites, executives read shortlists."
      />
      {members.isPending ? <Spinner label="Loading members" className="flex justify-center p-10" /> : null}
      {members.isError ? (
        <div className="p-5">
          <Alert tone="danger" title="Could not load the members">
            {errorMessage(members.error)}
          </Alert>
        </div>
      ) : null}
      {members.data?.length === 0 ? <EmptyState title="No members">This organization has no members.</EmptyState> : null}
      {members.data && members.data.length > 0 && renderMembers ? renderMembers(members.data) : null}
      {members.data && members.data.length > 0 && !renderMembers ? (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <thead className="border-b border-line text-xs text-ink-muted">
              <tr>
                <th scope="col" className="px-5 py-2.5 font-medium">Name</th>
                <th scope="col" className="px-5 py-2.5 font-medium">E-mail</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Role</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Joined</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {members.data.map((member) => (
                <tr key={member.userId}>
                  <td className="px-5 py-3 font-medium text-ink">{member.name}</td>
                  <td className="px-5 py-3 text-ink-muted">{member.email}</td>
                  <td className="px-5 py-3">
                    <Badge tone={member.role === 'owner' ? 'accent' : 'neutral'}>{roleLabels[member.role]}</Badge>
                  </td>
                  <td className="px-5 py-3 text-ink-muted">{dateText(member.joinedAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </Card>
  );
}

import { Card, CardHeader } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { useMe } from '../../../features/auth/api/get-me';
import { getInvitationsQueryOptions } from '../../../features/invitations/api/get-invitations';
import { InviteForm } from '../../../features/invitations/components/invite-form';
import { PendingInvitations } from '../../../features/invitations/components/pending-invitations';
import { MemberRoster } from '../../../features/members/components/member-roster';
import { getMembersQueryOptions } from '../../../features/organizations/api/get-members';
import { MembersTable } from '../../../features/organizations/components/members-table';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Starts loading the member list (and, for owners, the invitations) with the page's code.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'members', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const membership = await orgMembership(queryClient, params.orgId);
    if (!membership) return null;
    void queryClient.prefetchQuery(getMembersQueryOptions(params.orgId ?? ''));
    if (roleCan(membership.role, 'members:manage')) void queryClient.prefetchQuery(getInvitationsQueryOptions(params.orgId ?? ''));
    return null;
  };

/** The organization's members; owners also change roles, remove members and invite people. */
export default function MembersRoute() {
  const { orgId, orgName, role } = useOrgContext();
  const me = useMe();
  const canManage = roleCan(role, 'members:manage');
  return (
    <>
      <PageHeader title="Members" description={`People in ${orgName} and their roles.`} />
      <div className="flex flex-col gap-6">
        <MembersTable
          orgId={orgId}
          renderMembers={(members) => (
            <MemberRoster orgId={orgId} orgName={orgName} members={members} canManage={canManage} currentUserId={me.data?.user.id ?? null} />
          )}
        />
        {canManage ? (
          <>
            <Card>
              <CardHeader title="Invite someone" description="They get an e-mail with a link that works for 7 days. Each open invitation holds a seat." />
              <InviteForm orgId={orgId} />
            </Card>
            <Card>
              <CardHeader title="Open invitations" description="Resend sends a new link and 7 more days; revoke frees the seat." />
              <PendingInvitations orgId={orgId} />
            </Card>
          </>
        ) : null}
      </div>
    </>
  );
}

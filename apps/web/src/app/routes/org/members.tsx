import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { getMembersQueryOptions } from '../../../features/organizations/api/get-members';
import { MembersTable } from '../../../features/organizations/components/members-table';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Starts loading the member list with the page's code.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'members', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (await orgMembership(queryClient, params.orgId)) void queryClient.prefetchQuery(getMembersQueryOptions(params.orgId ?? ''));
    return null;
  };

/** The organization's members (read-only for now). */
export default function MembersRoute() {
  const { orgId, orgName } = useOrgContext();
  return (
    <>
      <PageHeader title="Members" description={`People in ${orgName} and their roles.`} />
      <MembersTable orgId={orgId} />
    </>
  );
}

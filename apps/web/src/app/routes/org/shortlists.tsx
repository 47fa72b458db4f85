import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { getOrgShortlistsQueryOptions } from '../../../features/shortlists/api/get-org-shortlists';
import { OrgShortlistList } from '../../../features/shortlists/components/org-shortlist-list';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Starts loading the organization's shortlists with the page's code.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'shortlists', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (await orgMembership(queryClient, params.orgId)) void queryClient.prefetchQuery(getOrgShortlistsQueryOptions(params.orgId ?? ''));
    return null;
  };

/** Every shortlist of the organization, grouped by workspace: the executive's landing page. */
export default function ShortlistsRoute() {
  const { orgId, orgName, role } = useOrgContext();
  return (
    <>
      <PageHeader
        title="Shortlists"
        description={
          roleCan(role, 'shortlist:write')
            ? `Ranked candidate sites in ${orgName}, by workspace. Build and share them in a workspace’s step 4.`
            : `Ranked candidate sites prepared by the planners of ${orgName}, by workspace.`
        }
      />
      <OrgShortlistList orgId={orgId} />
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { data, Outlet, useParams, type LoaderFunctionArgs } from 'react-router';
import { NotFound } from '../../../components/errors/not-found';
import { getMeQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { lastOrganizationRemember } from '../../../lib/last-organization';
import type { OrgContext } from './org-context';

/**
 * Checks membership before any organization page loads; someone else's organization is "not found",
 * like on the server, so ids cannot be probed.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: '/orgs/:orgId', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(getMeQueryOptions());
    if (!me?.memberships.some((m) => m.organization.id === params.orgId)) {
      throw data('Organization not found', { status: 404 });
    }
    return null;
  };

/** Frame for the organization's pages; hands them the organization and role. */
export default function OrgRoot() {
  const { orgId = '' } = useParams();
  const me = useMe();
  const membership = me.data?.memberships.find((m) => m.organization.id === orgId);

  useEffect(() => {
    if (membership) lastOrganizationRemember(orgId);
  }, [membership, orgId]);

  if (!membership) return <NotFound />;
  const context: OrgContext = { orgId, orgName: membership.organization.name, role: membership.role };
  return <Outlet context={context} />;
}

import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { AuditLog } from '../../../features/organizations/components/audit-log';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Only owners may open the audit log; other roles get a clear "not for your role" page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'audit-log', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const membership = await orgMembership(queryClient, params.orgId);
    // Signed out or not a member: the guard and the organization route above answer that.
    if (!membership) return null;
    if (!roleCan(membership.role, 'audit-log:read')) {
      throw data('Only owners of this organization can read its audit log.', { status: 403 });
    }
    return null;
  };

/** The organization's audit log. */
export default function AuditLogRoute() {
  const { orgId, orgName } = useOrgContext();
  return (
    <>
      <PageHeader title="Audit log" description={`Sign-ins and changes in ${orgName}.`} />
      <AuditLog orgId={orgId} />
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { getBillingQueryOptions } from '../../../features/billing/api/get-billing';
import { BillingOverviewPanel } from '../../../features/billing/components/billing-overview';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Only owners may open billing; other roles get a clear "not for your role" page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'billing', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const membership = await orgMembership(queryClient, params.orgId);
    if (!membership) return null;
    if (!roleCan(membership.role, 'billing:manage')) {
      throw data('Only owners of this organization can see and change its billing.', { status: 403 });
    }
    void queryClient.prefetchQuery(getBillingQueryOptions(params.orgId ?? ''));
    return null;
  };

/** The organization's plan, seats, credits, ledger and receipts. */
export default function BillingRoute() {
  const { orgId, orgName } = useOrgContext();
  return (
    <>
      <PageHeader title="Billing" description={`Seats and credits of ${orgName}. Prices are in euros.`} />
      <BillingOverviewPanel orgId={orgId} />
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { orgMembership } from './org-membership';

/**
 * `/orgs/:orgId` opens the organization's workspaces; executives land on the shortlists they read.
 * @param queryClient the app's query client
 * @returns the loader (always redirects)
 * @example { index: true, loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const membership = await orgMembership(queryClient, orgId);
    throw redirect(membership?.role === 'executive' ? paths.org.shortlists.getHref(orgId) : paths.org.workspaces.getHref(orgId));
  };

/** Never shown: the loader always redirects. */
export default function OrgIndexRoute() {
  return null;
}

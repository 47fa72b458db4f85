import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { paths } from '../../../config/paths';
import { getMeQueryOptions } from '../../../features/auth/api/get-me';
import { lastOrganizationId } from '../../../lib/last-organization';

/**
 * "/" opens the last organization used in this browser, else the first one, else the welcome page: its
 * shortlists for an executive there, its workspaces for every other role.
 * @param queryClient the app's query client
 * @returns the loader (always redirects)
 * @example { index: true, loader: clientLoader(queryClient) }
 */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(getMeQueryOptions());
  if (!me) throw redirect(paths.auth.signIn.getHref());
  const last = lastOrganizationId();
  const membership = me.memberships.find((m) => m.organization.id === last) ?? me.memberships[0];
  if (!membership) throw redirect(paths.welcome.getHref());
  const orgId = membership.organization.id;
  // Same landing as the organization's index: executives read shortlists, everyone else works in workspaces.
  throw redirect(membership.role === 'executive' ? paths.org.shortlists.getHref(orgId) : paths.org.workspaces.getHref(orgId));
};

/** Never shown: the loader always redirects. */
export default function HomeRoute() {
  return null;
}

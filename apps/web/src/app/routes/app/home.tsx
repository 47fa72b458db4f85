import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { paths } from '../../../config/paths';
import { getMeQueryOptions } from '../../../features/auth/api/get-me';
import { lastOrganizationId } from '../../../lib/last-organization';

/**
 * "/" opens the last organization used in this browser, else the first one, else the welcome page.
 * @param queryClient the app's query client
 * @returns the loader (always redirects)
 * @example { index: true, loader: clientLoader(queryClient) }
 */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(getMeQueryOptions());
  if (!me) throw redirect(paths.auth.signIn.getHref());
  const ids = me.memberships.map((m) => m.organization.id);
  const last = lastOrganizationId();
  const orgId = last && ids.includes(last) ? last : ids[0];
  throw redirect(orgId ? paths.org.workspaces.getHref(orgId) : paths.welcome.getHref());
};

/** Never shown: the loader always redirects. */
export default function HomeRoute() {
  return null;
}

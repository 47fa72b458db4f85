import { redirect, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';

/**
 * `/orgs/:orgId` opens the organization's workspaces.
 * @returns the loader (always redirects)
 * @example { index: true, loader: clientLoader(queryClient) }
 */
export const clientLoader =
  () =>
  ({ params }: LoaderFunctionArgs) => {
    throw redirect(paths.org.workspaces.getHref(params.orgId ?? ''));
  };

/** Never shown: the loader always redirects. */
export default function OrgIndexRoute() {
  return null;
}

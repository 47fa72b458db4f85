import { Button, Dialog } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { paths } from '../../../config/paths';
import { getWorkspacesQueryOptions } from '../../../features/workspaces/api/get-workspaces';
import { CreateWorkspaceForm } from '../../../features/workspaces/components/create-workspace-form';
import { WorkspaceList } from '../../../features/workspaces/components/workspace-list';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Starts loading the workspace list with the page's code.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'workspaces', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (await orgMembership(queryClient, params.orgId)) void queryClient.prefetchQuery(getWorkspacesQueryOptions(params.orgId ?? ''));
    return null;
  };

/** The organization's studies, with "New workspace" for the roles that may create one. */
export default function WorkspacesRoute() {
  const { orgId, orgName, role } = useOrgContext();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const canCreate = roleCan(role, 'workspace:create');

  return (
    <>
      <PageHeader
        title="Workspaces"
        description={`Site-selection studies in ${orgName}.`}
        actions={canCreate ? <Button onClick={() => setCreating(true)}>New workspace</Button> : undefined}
      />
      <WorkspaceList orgId={orgId} onCreate={canCreate ? () => setCreating(true) : undefined} />
      {canCreate ? (
        <Dialog
          open={creating}
          onClose={() => setCreating(false)}
          title="New workspace"
          description="A workspace holds one study: its customers, demand surface, sites and shortlist."
        >
          <CreateWorkspaceForm
            orgId={orgId}
            onCancel={() => setCreating(false)}
            onCreated={(workspace) => {
              setCreating(false);
              navigate(paths.org.workspace.getHref(orgId, workspace.id));
            }}
          />
        </Dialog>
      ) : null}
    </>
  );
}

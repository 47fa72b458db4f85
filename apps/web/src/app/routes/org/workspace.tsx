import { Button, Card, Dialog, Spinner } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { getWorkspaceQueryOptions, useWorkspace } from '../../../features/workspaces/api/get-workspace';
import { DeleteWorkspaceConfirm } from '../../../features/workspaces/components/delete-workspace-confirm';
import { EditWorkspaceForm } from '../../../features/workspaces/components/edit-workspace-form';
import { InspectorEmptyState } from '../../../features/workspaces/components/inspector-empty-state';
import { MapEmptyState } from '../../../features/workspaces/components/map-empty-state';
import { StudyOutline } from '../../../features/workspaces/components/study-outline';
import { roleCan } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Loads the workspace before the page shows; a missing one (or another organization's) becomes the 404 page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'workspaces/:workspaceId', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (!(await orgMembership(queryClient, params.orgId))) return null;
    await queryClient.ensureQueryData(getWorkspaceQueryOptions(params.orgId ?? '', params.workspaceId ?? ''));
    return null;
  };

/** One study: its four steps on the left, the map in the middle, the inspector on the right. */
export default function WorkspaceRoute() {
  const { orgId, role } = useOrgContext();
  const { workspaceId = '' } = useParams();
  const navigate = useNavigate();
  const workspace = useWorkspace(orgId, workspaceId);
  const [dialog, setDialog] = useState<'edit' | 'delete' | null>(null);

  if (!workspace.data) return <Spinner label="Loading the workspace" className="flex justify-center p-16" />;
  const ws = workspace.data;

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <Link to={paths.org.workspaces.getHref(orgId)} className="text-sm text-ink-muted hover:text-accent">
            ← Workspaces
          </Link>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight text-ink">{ws.name}</h1>
          {ws.description ? <p className="mt-1 max-w-3xl text-sm whitespace-pre-line text-ink-muted">{ws.description}</p> : null}
          <p className="mt-1 text-xs text-ink-faint">
            Created {dateText(ws.createdAt)}
            {ws.createdBy ? ` by ${ws.createdBy.name}` : ''} · updated {dateText(ws.updatedAt)}
          </p>
        </div>
        <div className="flex gap-2">
          {roleCan(role, 'workspace:update') ? (
            <Button variant="secondary" onClick={() => setDialog('edit')}>
              Edit details
            </Button>
          ) : null}
          {roleCan(role, 'workspace:delete') ? (
            <Button variant="ghost" className="text-danger hover:text-danger" onClick={() => setDialog('delete')}>
              Delete
            </Button>
          ) : null}
        </div>
      </div>

      <div className="grid gap-4 lg:grid-cols-[17rem_minmax(0,1fr)_16rem]">
        <Card className="p-2">
          <h2 className="px-3 pt-2 text-xs font-semibold tracking-wide text-ink-faint uppercase">Study outline</h2>
          <StudyOutline />
        </Card>
        <section aria-label="Map">
          <MapEmptyState />
        </section>
        <Card>
          <InspectorEmptyState />
        </Card>
      </div>

      <Dialog open={dialog === 'edit'} onClose={() => setDialog(null)} title="Edit workspace">
        <EditWorkspaceForm orgId={orgId} workspace={ws} onDone={() => setDialog(null)} />
      </Dialog>
      <Dialog open={dialog === 'delete'} onClose={() => setDialog(null)} title="Delete this workspace?">
        <DeleteWorkspaceConfirm
          orgId={orgId}
          workspace={ws}
          onCancel={() => setDialog(null)}
          onDeleted={() => navigate(paths.org.workspaces.getHref(orgId), { replace: true })}
        />
      </Dialog>
    </div>
  );
}

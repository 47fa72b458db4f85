import { Button, EmptyState, LogoMark, Spinner } from '@demandscape/ui';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { dateText } from '../../../lib/format';
import { useWorkspaces } from '../api/get-workspaces';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type WorkspaceListProps = {
  orgId: string;
  /** Present only for roles that may create workspaces. */
  onCreate?: () => void;
};

/**
 * The organization's studies as cards, newest activity first.
 * @param props the organization and, for roles that may, a create handler
 * @returns the grid, or its loading, error or empty state
 * @example <WorkspaceList orgId={orgId} onCreate={canCreate ? () => setOpen(true) : undefined} />
 */
export function WorkspaceList({ orgId, onCreate }: WorkspaceListProps) {
  const workspaces = useWorkspaces(orgId);

  if (workspaces.isPending) return <Spinner label="Loading workspaces" className="flex justify-center p-16" />;
  if (workspaces.isError) {
    return (
      <LoadErrorAlert title="Could not load the workspaces" error={workspaces.error} onRetry={workspaces.refetch} />
    );
  }
  if (workspaces.data.length === 0) {
    return (
      <div className="rounded-panel border border-dashed border-line-strong bg-surface">
        <EmptyState
          icon={<LogoMark size={40} title="" className="text-ink-faint" />}
          title="No workspaces yet"
          action={onCreate ? <Button onClick={onCreate}>New workspace</Button> : undefined}
        >
          {onCreate
            ? 'A workspace is one site-selection study, such as “North corridor 2027”: its customer file, demand surface, sites and shortlist.'
            : 'A workspace is one site-selection study. Analysts, planners and owners create them; shortlists shared with you will appear here.'}
        </EmptyState>
      </div>
    );
  }

  const sorted = [...workspaces.data].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  return (
    <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
      {sorted.map((workspace) => (
        <li key={workspace.id}>
          <Link
            to={paths.org.workspace.getHref(orgId, workspace.id)}
            className="flex h-full flex-col gap-2 rounded-panel border border-line bg-surface p-5 shadow-panel transition-colors hover:border-accent"
          >
            <span className="text-base font-semibold text-ink">{workspace.name}</span>
            {workspace.description ? (
              <span className="line-clamp-2 text-sm text-ink-muted">{workspace.description}</span>
            ) : (
              <span className="text-sm text-ink-faint">No description</span>
            )}
            <span className="mt-auto pt-2 text-xs text-ink-muted">
              Updated {dateText(workspace.updatedAt)}
              {workspace.createdBy ? ` · created by ${workspace.createdBy.name}` : ''}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

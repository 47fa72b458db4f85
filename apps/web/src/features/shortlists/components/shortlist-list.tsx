import { Badge, Button, Spinner } from '@demandscape/ui';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { dateText } from '../../../lib/format';
import { useShortlists } from '../api/get-shortlists';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type ShortlistListProps = {
  orgId: string;
  workspaceId: string;
  canWrite: boolean;
  onOpen: (shortlistId: string) => void;
};

/**
 * A workspace's shortlists, newest change first: version, number of sites, when it was shared, and links
 * to open it here or on its read-only page.
 * @param props the workspace, rights and the open handler
 * @returns the list, or its loading, error or empty state
 * @example <ShortlistList orgId={o} workspaceId={w} canWrite onOpen={setOpenId} />
 */
export function ShortlistList({ orgId, workspaceId, canWrite, onOpen }: ShortlistListProps) {
  const shortlists = useShortlists(orgId, workspaceId);
  if (shortlists.isPending) return <Spinner label="Loading shortlists" className="flex justify-center p-6" />;
  if (shortlists.isError) {
    return (
      <LoadErrorAlert title="Could not load the shortlists" error={shortlists.error} onRetry={shortlists.refetch} />
    );
  }
  if (shortlists.data.length === 0) {
    return (
      <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">
        {canWrite
          ? 'No shortlists yet. Start one from a finished scoring run: choose sites, order them, add notes.'
          : 'No shortlists yet. Planners and owners build them from a scoring run.'}
      </p>
    );
  }
  const sorted = [...shortlists.data].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  return (
    <ul className="flex flex-col gap-2" aria-label="Shortlists in this workspace">
      {sorted.map((s) => (
        <li key={s.id} className="flex flex-wrap items-center justify-between gap-3 rounded-control border border-line bg-surface p-3">
          <div className="min-w-0">
            <p className="font-medium text-ink">{s.name}</p>
            <p className="text-xs text-ink-muted tabular-nums">
              Version {s.latestVersion} · {s.itemCount} {s.itemCount === 1 ? 'site' : 'sites'} · updated {dateText(s.updatedAt)}
              {s.createdBy ? ` · by ${s.createdBy.name}` : ''}
            </p>
          </div>
          <div className="flex items-center gap-2">
            {s.sharedAt ? <Badge tone="success">Shared {dateText(s.sharedAt)}</Badge> : <Badge>Not shared</Badge>}
            <Link className="text-sm text-accent hover:underline" to={paths.org.shortlist.getHref(orgId, s.id)}>
              Read-only page
            </Link>
            <Button size="sm" variant="secondary" onClick={() => onOpen(s.id)} aria-label={`Open ${s.name}`}>
              Open
            </Button>
          </div>
        </li>
      ))}
    </ul>
  );
}

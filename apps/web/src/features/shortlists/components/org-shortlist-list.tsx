import { Badge, EmptyState, Spinner } from '@demandscape/ui';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { dateText } from '../../../lib/format';
import { useOrgShortlists } from '../api/get-org-shortlists';
import type { ShortlistSummary } from '../types';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type OrgShortlistListProps = { orgId: string };

/**
 * Every shortlist of the organization grouped by workspace (workspaces A–Z, newest change first inside),
 * with when it was shared and a link to its read-only page.
 * @param props the organization
 * @returns the grouped list, or its loading, error or empty state
 * @example <OrgShortlistList orgId={orgId} />
 */
export function OrgShortlistList({ orgId }: OrgShortlistListProps) {
  const shortlists = useOrgShortlists(orgId);
  if (shortlists.isPending) return <Spinner label="Loading shortlists" className="flex justify-center p-16" />;
  if (shortlists.isError) {
    return (
      <LoadErrorAlert title="Could not load the shortlists" error={shortlists.error} onRetry={shortlists.refetch} />
    );
  }
  if (shortlists.data.length === 0) {
    return (
      <div className="rounded-panel border border-dashed border-line-strong bg-surface">
        <EmptyState title="No shortlists yet">
          Planners build shortlists from a workspace’s ranking (step 4) and share them; they appear here with the date they were shared.
        </EmptyState>
      </div>
    );
  }

  const groups = new Map<string, { name: string; items: ShortlistSummary[] }>();
  for (const s of shortlists.data) {
    const group = groups.get(s.workspaceId) ?? { name: s.workspaceName, items: [] };
    group.items.push(s);
    groups.set(s.workspaceId, group);
  }
  const ordered = [...groups.entries()].sort((a, b) => a[1].name.localeCompare(b[1].name));

  return (
    <div className="flex flex-col gap-6">
      {ordered.map(([workspaceId, group]) => (
        <section key={workspaceId} aria-label={group.name} className="flex flex-col gap-2">
          <h2 className="text-sm font-semibold text-ink-muted">{group.name}</h2>
          <ul className="flex flex-col gap-2">
            {[...group.items]
              .sort((a, b) => b.updatedAt.localeCompare(a.updatedAt))
              .map((s) => (
                <li key={s.id}>
                  <Link
                    to={paths.org.shortlist.getHref(orgId, s.id)}
                    className="flex flex-wrap items-center justify-between gap-3 rounded-panel border border-line bg-surface p-4 shadow-panel transition-colors hover:border-accent"
                  >
                    <span className="flex min-w-0 flex-col">
                      <span className="font-semibold text-ink">{s.name}</span>
                      <span className="text-xs text-ink-muted tabular-nums">
                        Version {s.latestVersion} · {s.itemCount} {s.itemCount === 1 ? 'site' : 'sites'}
                        {s.createdBy ? ` · by ${s.createdBy.name}` : ''}
                      </span>
                    </span>
                    {s.sharedAt ? <Badge tone="success">Shared {dateText(s.sharedAt)}</Badge> : <Badge>Not shared yet</Badge>}
                  </Link>
                </li>
              ))}
          </ul>
        </section>
      ))}
    </div>
  );
}

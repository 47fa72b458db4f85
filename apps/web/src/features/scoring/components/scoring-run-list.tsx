import { Alert, Badge, Button, Dialog, Spinner } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useDeleteScoringRun } from '../api/delete-scoring-run';
import { useScoringRuns } from '../api/get-scoring-runs';
import type { ScoringRunStatus, ScoringRunSummaryJson } from '../types';

export type ScoringRunListProps = {
  orgId: string;
  workspaceId: string;
  canWrite: boolean;
  chosenId: string | null;
  onChoose: (runId: string | null) => void;
};

const statusBadges: Record<ScoringRunStatus, { label: string; tone: 'neutral' | 'accent' | 'success' | 'danger' }> = {
  queued: { label: 'Queued', tone: 'neutral' },
  running: { label: 'Running', tone: 'accent' },
  succeeded: { label: 'Ready', tone: 'success' },
  failed: { label: 'Failed', tone: 'danger' },
};

/**
 * The workspace's scoring runs, newest first: choose one to show its ranking; planners delete old ones.
 * @param props the workspace, rights, the chosen run and what to do on choosing
 * @returns the list, or its loading, error or empty state
 * @example <ScoringRunList orgId={o} workspaceId={w} canWrite chosenId={id} onChoose={setId} />
 */
export function ScoringRunList({ orgId, workspaceId, canWrite, chosenId, onChoose }: ScoringRunListProps) {
  const runs = useScoringRuns(orgId, workspaceId);
  const remove = useDeleteScoringRun(orgId, workspaceId);
  const [toDelete, setToDelete] = useState<ScoringRunSummaryJson | null>(null);

  if (runs.isPending) return <Spinner label="Loading scoring runs" className="flex justify-center p-4" />;
  if (runs.isError) {
    return (
      <Alert tone="danger" title="Could not load the scoring runs">
        {errorMessage(runs.error)}
      </Alert>
    );
  }
  if (runs.data.length === 0) {
    return <p className="text-sm text-ink-muted">{canWrite ? 'No scoring runs yet.' : 'No scoring runs yet. Planners and owners score the sites.'}</p>;
  }
  return (
    <>
      <ul aria-label="Scoring runs" className="flex flex-col divide-y divide-line rounded-panel border border-line">
        {runs.data.map((run) => {
          const badge = statusBadges[run.status];
          const chosen = run.id === chosenId;
          return (
            <li key={run.id} className={`flex flex-wrap items-center justify-between gap-2 px-3 py-2 ${chosen ? 'bg-accent-soft/40' : ''}`}>
              <div className="min-w-0">
                <p className="truncate text-sm font-medium text-ink">{run.name}</p>
                <p className="text-xs text-ink-muted tabular-nums">
                  {run.candidateCount.toLocaleString('en')} candidates · surface “{run.surfaceName}” · {dateTimeText(run.createdAt)}
                  {run.createdBy ? ` · ${run.createdBy.name}` : ''}
                </p>
              </div>
              <div className="flex items-center gap-2">
                <Badge tone={badge.tone}>{badge.label}</Badge>
                <Button size="sm" variant={chosen ? 'primary' : 'secondary'} aria-pressed={chosen} onClick={() => onChoose(run.id)}>
                  {chosen ? 'Shown' : 'Show'}
                </Button>
                {canWrite && run.status !== 'queued' && run.status !== 'running' ? (
                  <Button size="sm" variant="ghost" className="text-danger hover:text-danger" onClick={() => setToDelete(run)} aria-label={`Delete ${run.name}`}>
                    Delete
                  </Button>
                ) : null}
              </div>
            </li>
          );
        })}
      </ul>
      {remove.error ? <Alert tone="danger">{errorMessage(remove.error)}</Alert> : null}
      <Dialog open={toDelete !== null} onClose={() => setToDelete(null)} title="Delete this scoring run?">
        <p className="text-sm text-ink">
          “{toDelete?.name}”, its ranking, stability check and candidate sets will be deleted for everyone in the workspace. The sites and
          the surface stay. This cannot be undone.
        </p>
        <div className="flex justify-end gap-2">
          <Button variant="ghost" onClick={() => setToDelete(null)}>
            Keep it
          </Button>
          <Button
            variant="danger"
            isLoading={remove.isPending}
            onClick={() => {
              const id = toDelete!.id;
              remove.mutate(id, {
                onSuccess: () => {
                  if (id === chosenId) onChoose(null);
                },
                onSettled: () => setToDelete(null),
              });
            }}
          >
            Delete run
          </Button>
        </div>
      </Dialog>
    </>
  );
}

import { Alert, Button, Dialog, ProgressBar } from '@demandscape/ui';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useCancelSurface } from '../api/cancel-surface';
import { surfaceIsActive, useSurface } from '../api/get-surface';
import { surfacesKey } from '../api/get-surfaces';
import { useDeleteSurface } from '../api/delete-surface';
import { useRetrySurface } from '../api/retry-surface';
import type { Surface } from '../types';
import { metresText, numberText } from '../utils/density-units';
import { CAUTION_LINE, kernelOptions } from '../utils/surface-explanations';
import { SurfaceStatusBadge } from './surface-status-badge';
import { SurfaceThresholds } from './surface-thresholds';

export type SurfaceRunCardProps = {
  orgId: string;
  workspaceId: string;
  surface: Surface;
  /** Owners and analysts: cancel, retry, delete. */
  canWrite: boolean;
  selected: boolean;
  onSelect: (surface: Surface) => void;
};

function seconds(start: string | null, end: string | null): number | null {
  if (!start || !end) return null;
  const s = (new Date(end).getTime() - new Date(start).getTime()) / 1000;
  return Number.isFinite(s) && s >= 0 ? s : null;
}

function progressText(s: Surface): string {
  if (s.status === 'queued') return 'Queued: waiting for a worker';
  if (s.status === 'running') return `Running: ${Math.round(s.progress * 100)} %`;
  if (s.status === 'succeeded') return 'Done: 100 %';
  if (s.status === 'cancelled') return `Cancelled at ${Math.round(s.progress * 100)} %`;
  return `Stopped at ${Math.round(s.progress * 100)} %`;
}

/**
 * One demand-surface run: status, a progress bar that follows polling while queued or running, timings,
 * the inputs it used, the percent-volume contours when done, the error when failed, and its actions.
 * @param props the workspace, the run (from the list), rights and selection
 * @returns the card
 * @example <SurfaceRunCard orgId={o} workspaceId={w} surface={s} canWrite selected={false} onSelect={show} />
 */
export function SurfaceRunCard({ orgId, workspaceId, surface: listed, canWrite, selected, onSelect }: SurfaceRunCardProps) {
  const { data: s } = useSurface(orgId, workspaceId, listed);
  const queryClient = useQueryClient();
  const cancel = useCancelSurface(orgId, workspaceId);
  const retry = useRetrySurface(orgId, workspaceId);
  const remove = useDeleteSurface(orgId, workspaceId);
  const wasActive = useRef(surfaceIsActive(s));
  const [confirmDelete, setConfirmDelete] = useState(false);

  // When a run ends, the list (and anything showing results) should see it at once.
  useEffect(() => {
    const active = surfaceIsActive(s);
    if (wasActive.current && !active) void queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId), exact: true });
    wasActive.current = active;
  }, [s, queryClient, orgId, workspaceId]);

  const active = surfaceIsActive(s);
  const kernel = kernelOptions.find((k) => k.value === s.params.kernel)?.label.replace(' (suggested)', '') ?? s.params.kernel;
  const took = seconds(s.startedAt, s.finishedAt);
  const actionError = cancel.error ?? retry.error ?? remove.error;

  return (
    <article
      aria-label={`Demand surface ${s.name}`}
      className={`flex flex-col gap-3 rounded-panel border p-4 ${selected ? 'border-accent bg-accent-soft/40' : 'border-line bg-surface'}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h4 className="truncate text-sm font-semibold text-ink">{s.name}</h4>
          <p className="text-xs text-ink-muted tabular-nums">
            {kernel}
            {s.resolved ? ` · bandwidth ${metresText(s.resolved.bandwidth.value)} · cells ${metresText(s.resolved.cellSize.value)} · ${s.resolved.grid.width} × ${s.resolved.grid.height}` : ''}
            {` · ${s.pointCount.toLocaleString('en')} customers · ${s.costCredits.toLocaleString('en')} ${s.costCredits === 1 ? 'credit' : 'credits'}`}
          </p>
        </div>
        <SurfaceStatusBadge status={s.status} />
      </div>

      {s.status !== 'succeeded' ? (
        <ProgressBar
          label={`Progress of ${s.name}`}
          value={s.status === 'queued' ? null : s.progress}
          valueText={progressText(s)}
          tone={s.status === 'failed' ? 'danger' : 'accent'}
        />
      ) : null}

      <p className="text-xs text-ink-faint tabular-nums">
        Queued {dateTimeText(s.queuedAt)}
        {s.startedAt ? ` · started ${dateTimeText(s.startedAt)}` : ''}
        {s.finishedAt ? ` · ended ${dateTimeText(s.finishedAt)}` : ''}
        {took !== null ? ` · took ${numberText(took)} s` : ''}
        {s.attempts > 1 ? ` · attempt ${s.attempts}` : ''}
        {s.createdBy ? ` · by ${s.createdBy.name}` : ''}
      </p>

      {s.status === 'failed' ? (
        <Alert tone="danger" title="The run failed">
          {s.error?.message ?? 'The server did not say why.'}
        </Alert>
      ) : null}

      {s.status === 'succeeded' && s.thresholds?.length ? (
        <>
          <SurfaceThresholds thresholds={s.thresholds} unit={s.params.unit} />
          <p className="text-xs text-ink-muted">{CAUTION_LINE}</p>
        </>
      ) : null}

      {actionError ? <Alert tone="danger">{errorMessage(actionError)}</Alert> : null}

      <div className="flex flex-wrap gap-2">
        {s.status === 'succeeded' ? (
          <Button size="sm" variant={selected ? 'primary' : 'secondary'} onClick={() => onSelect(s)} aria-pressed={selected}>
            {selected ? 'On the map' : 'Show on the map'}
          </Button>
        ) : null}
        {canWrite && active ? (
          <Button size="sm" variant="secondary" onClick={() => cancel.mutate(s.id)} isLoading={cancel.isPending}>
            Cancel
          </Button>
        ) : null}
        {canWrite && (s.status === 'failed' || s.status === 'cancelled') ? (
          <Button size="sm" variant="secondary" onClick={() => retry.mutate(s.id)} isLoading={retry.isPending}>
            Retry
          </Button>
        ) : null}
        {canWrite && !active ? (
          <Button size="sm" variant="ghost" className="text-danger hover:text-danger" onClick={() => setConfirmDelete(true)}>
            Delete
          </Button>
        ) : null}
      </div>
      <Dialog open={confirmDelete} onClose={() => setConfirmDelete(false)} title="Delete this demand surface?">
        <p className="text-sm text-ink">
          “{s.name}” and its map layer, contours and numbers will be deleted for everyone in the workspace. Credits already
          spent are not returned. This cannot be undone.
        </p>
        <div className="flex justify-end gap-2">
          <Button variant="ghost" onClick={() => setConfirmDelete(false)}>
            Keep it
          </Button>
          <Button variant="danger" isLoading={remove.isPending} onClick={() => remove.mutate(s.id, { onSettled: () => setConfirmDelete(false) })}>
            Delete surface
          </Button>
        </div>
      </Dialog>
    </article>
  );
}

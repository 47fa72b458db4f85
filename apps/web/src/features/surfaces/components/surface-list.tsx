import { Spinner } from '@demandscape/ui';
import { useSurfaces } from '../api/get-surfaces';
import type { Surface } from '../types';
import { SurfaceRunCard } from './surface-run-card';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type SurfaceListProps = {
  orgId: string;
  workspaceId: string;
  canWrite: boolean;
  selectedId: string | null;
  onSelect: (surface: Surface) => void;
};

/**
 * The workspace's demand-surface runs, newest first, each polling while it is queued or running.
 * @param props the workspace, rights and selection
 * @returns the list, or its loading, error or empty state
 * @example <SurfaceList orgId={o} workspaceId={w} canWrite selectedId={id} onSelect={(s) => setId(s.id)} />
 */
export function SurfaceList({ orgId, workspaceId, canWrite, selectedId, onSelect }: SurfaceListProps) {
  const surfaces = useSurfaces(orgId, workspaceId);
  if (surfaces.isPending) return <Spinner label="Loading demand surfaces" className="flex justify-center p-6" />;
  if (surfaces.isError) {
    return (
      <LoadErrorAlert title="Could not load the demand surfaces" error={surfaces.error} onRetry={surfaces.refetch} />
    );
  }
  if (surfaces.data.length === 0) {
    return (
      <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">
        {canWrite ? 'No demand surfaces yet. Set one up above; the cost is shown before it runs.' : 'No demand surfaces yet. Analysts and owners build them.'}
      </p>
    );
  }
  const sorted = [...surfaces.data].sort((a, b) => b.queuedAt.localeCompare(a.queuedAt));
  return (
    <div className="flex flex-col gap-3" aria-label="Demand surfaces" role="list">
      {sorted.map((s) => (
        <div role="listitem" key={s.id}>
          <SurfaceRunCard orgId={orgId} workspaceId={workspaceId} surface={s} canWrite={canWrite} selected={s.id === selectedId} onSelect={onSelect} />
        </div>
      ))}
    </div>
  );
}

import type { Surface, SurfaceSource } from '../types';
import { SurfaceForm } from './surface-form';
import { SurfaceList } from './surface-list';

export type SurfacesStepProps = {
  orgId: string;
  workspaceId: string;
  /** Imported customer files (the route passes them from the customer-files feature). */
  sources: SurfaceSource[];
  /** Owners and analysts: build, cancel, retry, delete. */
  canWrite: boolean;
  selectedId: string | null;
  onSelect: (surface: Surface) => void;
};

/**
 * Study step 2: the surface form with its live estimate (owners and analysts) and the runs with progress.
 * @param props the workspace, the files to build from, rights and the surface shown on the map
 * @returns the step's panel
 * @example <SurfacesStep orgId={o} workspaceId={w} sources={files} canWrite selectedId={id} onSelect={show} />
 */
export function SurfacesStep({ orgId, workspaceId, sources, canWrite, selectedId, onSelect }: SurfacesStepProps) {
  return (
    <div className="flex flex-col gap-6">
      {canWrite ? (
        <section aria-label="Build a demand surface" className="flex flex-col gap-3">
          <h3 className="text-base font-semibold text-ink">Build a demand surface</h3>
          <SurfaceForm orgId={orgId} workspaceId={workspaceId} sources={sources} onCreated={() => {}} />
        </section>
      ) : null}
      <section aria-label="Demand surfaces in this workspace" className="flex flex-col gap-3">
        <h3 className="text-sm font-semibold text-ink">Demand surfaces in this workspace</h3>
        <SurfaceList orgId={orgId} workspaceId={workspaceId} canWrite={canWrite} selectedId={selectedId} onSelect={onSelect} />
      </section>
    </div>
  );
}

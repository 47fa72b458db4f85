import { Button } from '@demandscape/ui';
import { useState } from 'react';
import { useCreateShortlist } from '../api/create-shortlist';
import { draftItemsBody } from '../utils/draft-items';
import { ShortlistBuilder } from './shortlist-builder';
import { ShortlistEditor } from './shortlist-editor';
import { ShortlistList } from './shortlist-list';

export type ShortlistStepProps = {
  orgId: string;
  workspaceId: string;
  /** Owners and planners: build, edit, share and delete shortlists. */
  canWrite: boolean;
};

type View = { kind: 'list' } | { kind: 'new' } | { kind: 'open'; id: string };

/**
 * Study step 4: the workspace's shortlists; "New shortlist" builds one from a finished scoring run, and an
 * open shortlist can be read at any version, edited into a new version, renamed, deleted or shared.
 * @param props the workspace and the viewer's rights
 * @returns the step's panel
 * @example <ShortlistStep orgId={orgId} workspaceId={workspaceId} canWrite={roleCan(role, 'shortlist:write')} />
 */
export function ShortlistStep({ orgId, workspaceId, canWrite }: ShortlistStepProps) {
  const [view, setView] = useState<View>({ kind: 'list' });
  const create = useCreateShortlist(orgId, workspaceId, { onSuccess: (s) => setView({ kind: 'open', id: s.id }) });

  if (view.kind === 'open') {
    return <ShortlistEditor orgId={orgId} workspaceId={workspaceId} shortlistId={view.id} canWrite={canWrite} onClose={() => setView({ kind: 'list' })} />;
  }
  if (view.kind === 'new' && canWrite) {
    return (
      <section aria-label="New shortlist" className="flex flex-col gap-3">
        <h3 className="text-base font-semibold text-ink">New shortlist</h3>
        <ShortlistBuilder
          orgId={orgId}
          workspaceId={workspaceId}
          mode="create"
          isSaving={create.isPending}
          saveError={create.error}
          onSave={(draft) =>
            create.mutate({
              name: draft.name,
              scoringRunId: draft.scoringRunId,
              items: draftItemsBody(draft.items),
              ...(draft.versionNote ? { versionNote: draft.versionNote } : {}),
            })
          }
          onCancel={() => {
            create.reset();
            setView({ kind: 'list' });
          }}
        />
      </section>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h3 className="text-sm font-semibold text-ink">Shortlists in this workspace</h3>
        {canWrite ? <Button onClick={() => setView({ kind: 'new' })}>New shortlist</Button> : null}
      </div>
      <ShortlistList orgId={orgId} workspaceId={workspaceId} canWrite={canWrite} onOpen={(id) => setView({ kind: 'open', id })} />
    </div>
  );
}

import { Alert, Button, Dialog, Spinner } from '@demandscape/ui';
import { useState } from 'react';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useCreateShortlistVersion } from '../api/create-shortlist-version';
import { useShortlist } from '../api/get-shortlist';
import { draftItemsBody } from '../utils/draft-items';
import { DeleteShortlistConfirm } from './delete-shortlist-confirm';
import { RenameShortlistForm } from './rename-shortlist-form';
import { ShareShortlistDialog } from './share-shortlist-dialog';
import { ShortlistBuilder } from './shortlist-builder';
import { ShortlistRankedTable } from './shortlist-ranked-table';
import { ShortlistSiteNotes } from './shortlist-site-notes';
import { ShortlistVersionLine } from './shortlist-version-line';
import { VersionPicker } from './version-picker';

export type ShortlistEditorProps = {
  orgId: string;
  workspaceId: string;
  shortlistId: string;
  /** Owners and planners: new versions, rename, delete, share. */
  canWrite: boolean;
  onClose: () => void;
};

/**
 * One shortlist inside its workspace: read any saved version, and (owners, planners) change sites, order and
 * notes and save them as a new version, rename, delete or share it with the organization's executives.
 * @param props the workspace, the shortlist, rights and the close handler
 * @returns the shortlist panel
 * @example <ShortlistEditor orgId={o} workspaceId={w} shortlistId={id} canWrite onClose={back} />
 */
export function ShortlistEditor({ orgId, workspaceId, shortlistId, canWrite, onClose }: ShortlistEditorProps) {
  const [version, setVersion] = useState<number | null>(null);
  const [editing, setEditing] = useState(false);
  const [dialog, setDialog] = useState<'rename' | 'delete' | 'share' | null>(null);
  const query = useShortlist(orgId, workspaceId, shortlistId, version);
  const save = useCreateShortlistVersion(orgId, workspaceId, shortlistId, {
    onSuccess: () => {
      setEditing(false);
      setVersion(null);
    },
  });

  const back = (
    <Button variant="link" className="w-fit" onClick={onClose}>
      ← All shortlists
    </Button>
  );
  if (query.isPending) return <Spinner label="Loading the shortlist" className="flex justify-center p-6" />;
  if (query.isError) {
    return (
      <div className="flex flex-col gap-3">
        {back}
        <Alert tone="danger" title="Could not load the shortlist">
          {errorMessage(query.error)}
        </Alert>
      </div>
    );
  }
  const s = query.data;
  const v = s.version;

  return (
    <div className="flex flex-col gap-5">
      {back}
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <h3 className="text-lg font-semibold text-ink">{s.name}</h3>
          <ShortlistVersionLine shortlist={s} />
        </div>
        <div className="flex flex-wrap gap-2">
          <Link className="inline-flex h-8 items-center px-2 text-sm text-accent hover:underline" to={paths.org.shortlist.getHref(orgId, s.id, v.version)}>
            Read-only page
          </Link>
          {canWrite ? (
            <>
              <Button size="sm" onClick={() => setDialog('share')}>
                Share with executives
              </Button>
              <Button size="sm" variant="secondary" onClick={() => setDialog('rename')}>
                Rename
              </Button>
              <Button size="sm" variant="ghost" className="text-danger hover:text-danger" onClick={() => setDialog('delete')}>
                Delete
              </Button>
            </>
          ) : null}
        </div>
      </div>

      <VersionPicker
        versions={s.versions}
        value={v.version}
        onChange={(n) => {
          setEditing(false);
          save.reset();
          setVersion(n);
        }}
      />

      {editing ? (
        <section aria-label="Edit as a new version" className="flex flex-col gap-3 rounded-panel border border-accent/40 p-4">
          <p className="text-sm text-ink-muted">
            Starting from version {v.version}. Saving adds version {s.latestVersion + 1}; earlier versions stay as they are.
          </p>
          <ShortlistBuilder
            key={`${s.id}-${v.version}`}
            orgId={orgId}
            workspaceId={workspaceId}
            mode="version"
            initial={{ runId: v.scoringRunId, items: [...v.items].sort((a, b) => a.order - b.order).map((i) => ({ siteId: i.siteId, name: i.name, note: i.note })) }}
            isSaving={save.isPending}
            saveError={save.error}
            onSave={(draft) =>
              save.mutate({ scoringRunId: draft.scoringRunId, items: draftItemsBody(draft.items), ...(draft.versionNote ? { versionNote: draft.versionNote } : {}) })
            }
            onCancel={() => {
              save.reset();
              setEditing(false);
            }}
          />
        </section>
      ) : (
        <>
          <ShortlistRankedTable version={v} />
          <ShortlistSiteNotes version={v} />
          {canWrite ? (
            <Button variant="secondary" className="w-fit" onClick={() => setEditing(true)}>
              Edit sites, order and notes
            </Button>
          ) : null}
        </>
      )}

      <section aria-label="Shared with" className="flex flex-col gap-1">
        <h4 className="text-sm font-semibold text-ink">Shared with</h4>
        {s.sharedWith.length === 0 ? (
          <p className="text-sm text-ink-muted">Not shared yet.</p>
        ) : (
          <ul className="flex flex-col gap-0.5 text-sm">
            {s.sharedWith.map((r) => (
              <li key={`${r.userId}-${r.sharedAt}`}>
                {r.name} <span className="text-ink-muted">({r.email})</span> · <span className="text-ink-faint">{dateTimeText(r.sharedAt)}</span>
              </li>
            ))}
          </ul>
        )}
      </section>

      {canWrite ? (
        <>
          <ShareShortlistDialog orgId={orgId} shortlist={s} open={dialog === 'share'} onClose={() => setDialog(null)} />
          <Dialog open={dialog === 'rename'} onClose={() => setDialog(null)} title="Rename shortlist">
            <RenameShortlistForm orgId={orgId} shortlist={s} onDone={() => setDialog(null)} />
          </Dialog>
          <Dialog open={dialog === 'delete'} onClose={() => setDialog(null)} title="Delete this shortlist?">
            <DeleteShortlistConfirm orgId={orgId} shortlist={s} onCancel={() => setDialog(null)} onDeleted={onClose} />
          </Dialog>
        </>
      ) : null}
    </div>
  );
}

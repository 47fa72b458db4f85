import { Alert, Button } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { useDeleteShortlist } from '../api/delete-shortlist';
import type { ShortlistSummary } from '../types';

export type DeleteShortlistConfirmProps = {
  orgId: string;
  shortlist: Pick<ShortlistSummary, 'id' | 'workspaceId' | 'name' | 'latestVersion'>;
  onDeleted: () => void;
  onCancel: () => void;
};

/**
 * Asks before deleting a shortlist and says what goes with it.
 * @param props the organization, the shortlist, and handlers for done and cancel
 * @returns the confirmation body for a dialog
 * @example <DeleteShortlistConfirm orgId={o} shortlist={s} onDeleted={back} onCancel={close} />
 */
export function DeleteShortlistConfirm({ orgId, shortlist, onDeleted, onCancel }: DeleteShortlistConfirmProps) {
  const mutation = useDeleteShortlist(orgId, shortlist.workspaceId, { meta: { errorsShownInline: true }, onSuccess: () => onDeleted() });
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink">
        “{shortlist.name}” and all {shortlist.latestVersion} {shortlist.latestVersion === 1 ? 'version' : 'versions'} will be deleted; executives it was
        shared with can no longer open it. The scoring runs and sites stay. This cannot be undone.
      </p>
      {mutation.isError ? <Alert tone="danger">{errorMessage(mutation.error)}</Alert> : null}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Keep it
        </Button>
        <Button variant="danger" onClick={() => mutation.mutate(shortlist.id)} isLoading={mutation.isPending}>
          Delete shortlist
        </Button>
      </div>
    </div>
  );
}

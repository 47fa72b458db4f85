import { Alert, Button } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import type { Workspace } from '../../../types/api';
import { useDeleteWorkspace } from '../api/delete-workspace';

export type DeleteWorkspaceConfirmProps = {
  orgId: string;
  workspace: Workspace;
  onDeleted: () => void;
  onCancel: () => void;
};

/**
 * Asks before deleting a workspace and says what goes with it.
 * @param props the organization, the workspace, and handlers for done and cancel
 * @returns the confirmation body for a dialog
 * @example <DeleteWorkspaceConfirm orgId={orgId} workspace={ws} onDeleted={goToList} onCancel={close} />
 */
export function DeleteWorkspaceConfirm({ orgId, workspace, onDeleted, onCancel }: DeleteWorkspaceConfirmProps) {
  const mutation = useDeleteWorkspace(orgId, workspace.id, { meta: { errorsShownInline: true }, onSuccess: onDeleted });
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink">
        “{workspace.name}” and everything in it will be deleted for every member of the organization. This cannot be
        undone.
      </p>
      {mutation.isError ? <Alert tone="danger">{errorMessage(mutation.error)}</Alert> : null}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Keep it
        </Button>
        <Button variant="danger" onClick={() => mutation.mutate()} isLoading={mutation.isPending}>
          Delete workspace
        </Button>
      </div>
    </div>
  );
}

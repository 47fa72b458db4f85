import { Alert, Button } from '@demandscape/ui';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { useDeleteCustomerFile } from '../api/delete-customer-file';
import type { CustomerFile } from '../types';

export type DeleteCustomerFileConfirmProps = {
  orgId: string;
  workspaceId: string;
  file: CustomerFile;
  onDeleted: () => void;
  onCancel: () => void;
};

/**
 * Asks before deleting a customer file; a file still used by a queued or running surface (409 IN_USE)
 * is explained instead of failing silently.
 * @param props the workspace, the file and handlers for done and cancel
 * @returns the dialog body
 * @example <DeleteCustomerFileConfirm orgId={o} workspaceId={w} file={f} onDeleted={close} onCancel={close} />
 */
export function DeleteCustomerFileConfirm({ orgId, workspaceId, file, onDeleted, onCancel }: DeleteCustomerFileConfirmProps) {
  const mutation = useDeleteCustomerFile(orgId, workspaceId, { onSuccess: onDeleted });
  const inUse = mutation.error instanceof ApiError && mutation.error.code === 'IN_USE';
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink">
        “{file.name}” and its customer points will be deleted. Demand surfaces already built from it stay, but cannot be
        rebuilt. This cannot be undone.
      </p>
      {mutation.isError ? (
        <Alert tone="danger" title={inUse ? 'This file is in use' : 'Could not delete the file'}>
          {errorMessage(mutation.error)}
          {inUse ? ' Wait for the surface to finish, or cancel it in the Demand surface step, then try again.' : ''}
        </Alert>
      ) : null}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Keep it
        </Button>
        <Button variant="danger" onClick={() => mutation.mutate(file.id)} isLoading={mutation.isPending}>
          Delete file
        </Button>
      </div>
    </div>
  );
}

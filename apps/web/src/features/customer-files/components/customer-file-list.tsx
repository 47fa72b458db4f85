import { Button, Dialog, Spinner } from '@demandscape/ui';
import { useState } from 'react';
import { dateText } from '../../../lib/format';
import { useCustomerFiles } from '../api/get-customer-files';
import type { CustomerFile } from '../types';
import { byteSizeText, countText } from '../utils/byte-size';
import { CustomerFileStatusBadge } from './customer-file-status-badge';
import { DeleteCustomerFileConfirm } from './delete-customer-file-confirm';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type CustomerFileListProps = {
  orgId: string;
  workspaceId: string;
  selectedId: string | null;
  onSelect: (file: CustomerFile) => void;
  /** Owners and analysts may delete. */
  canWrite: boolean;
  /** Called after the selected file was deleted. */
  onDeleted?: (fileId: string) => void;
};

/**
 * The workspace's customer files with status, counts, size and a delete action behind a confirmation.
 * @param props the workspace, selection and rights
 * @returns the list, or its loading, error or empty state
 * @example <CustomerFileList orgId={o} workspaceId={w} selectedId={id} onSelect={(f) => setId(f.id)} canWrite />
 */
export function CustomerFileList({ orgId, workspaceId, selectedId, onSelect, canWrite, onDeleted }: CustomerFileListProps) {
  const files = useCustomerFiles(orgId, workspaceId);
  const [deleting, setDeleting] = useState<CustomerFile | null>(null);

  if (files.isPending) return <Spinner label="Loading customer files" className="flex justify-center p-6" />;
  if (files.isError) {
    return (
      <LoadErrorAlert title="Could not load the customer files" error={files.error} onRetry={files.refetch} />
    );
  }
  if (files.data.length === 0) {
    return (
      <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">
        {canWrite
          ? 'No customer files yet. Upload one above to start the study.'
          : 'No customer files yet. An analyst or owner uploads them; you will see their validation reports here.'}
      </p>
    );
  }

  return (
    <>
      <ul aria-label="Customer files" className="flex flex-col divide-y divide-line rounded-control border border-line">
        {files.data.map((file) => (
          <li key={file.id} className={file.id === selectedId ? 'bg-accent-soft' : undefined}>
            <div className="flex flex-wrap items-center justify-between gap-3 px-3 py-2">
              <button type="button" className="min-w-0 flex-1 text-left" onClick={() => onSelect(file)} aria-current={file.id === selectedId || undefined}>
                <span className="block truncate text-sm font-medium text-ink">{file.name}</span>
                <span className="block text-xs text-ink-muted tabular-nums">
                  {file.status === 'imported'
                    ? `${countText(file.acceptedCount)} accepted · ${countText(file.rejectedCount)} rejected · `
                    : ''}
                  {byteSizeText(file.sizeBytes)} · {file.format.toUpperCase()} · uploaded {dateText(file.createdAt)}
                  {file.createdBy ? ` by ${file.createdBy.name}` : ''}
                </span>
              </button>
              <div className="flex items-center gap-2">
                <CustomerFileStatusBadge status={file.status} />
                {canWrite ? (
                  <Button variant="ghost" size="sm" className="text-danger hover:text-danger" onClick={() => setDeleting(file)} aria-label={`Delete ${file.name}`}>
                    Delete
                  </Button>
                ) : null}
              </div>
            </div>
          </li>
        ))}
      </ul>
      <Dialog open={deleting !== null} onClose={() => setDeleting(null)} title="Delete this customer file?">
        {deleting ? (
          <DeleteCustomerFileConfirm
            orgId={orgId}
            workspaceId={workspaceId}
            file={deleting}
            onCancel={() => setDeleting(null)}
            onDeleted={() => {
              onDeleted?.(deleting.id);
              setDeleting(null);
            }}
          />
        ) : null}
      </Dialog>
    </>
  );
}

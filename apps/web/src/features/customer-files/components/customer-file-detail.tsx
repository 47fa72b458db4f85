import { Alert, ProgressBar, Spinner } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { useCustomerFile } from '../api/get-customer-file';
import { useCustomerFilePreview } from '../api/get-customer-file-preview';
import type { CustomerFile } from '../types';
import { countText } from '../utils/byte-size';
import { ColumnMappingForm } from './column-mapping-form';
import { ValidationReport } from './validation-report';
import { LoadErrorAlert } from '../../../components/errors/load-error-alert';

export type CustomerFileDetailProps = {
  orgId: string;
  workspaceId: string;
  fileId: string;
  canWrite: boolean;
};

function MappingStep({ orgId, workspaceId, file }: { orgId: string; workspaceId: string; file: CustomerFile }) {
  const preview = useCustomerFilePreview(orgId, workspaceId, file.id);
  if (preview.isPending) return <Spinner label="Reading the first rows" className="flex justify-center p-6" />;
  if (preview.isError) {
    return (
      <LoadErrorAlert title="Could not read the first rows of the file" error={preview.error} onRetry={preview.refetch} />
    );
  }
  return <ColumnMappingForm orgId={orgId} workspaceId={workspaceId} file={file} preview={preview.data} onImportStarted={() => {}} />;
}

/**
 * One customer file through its life: the mapping step, the import in progress (polled), the validation
 * report, or the failure with a way back to the mapping.
 * @param props the workspace, the file and whether the viewer may upload and import
 * @returns the panel for the file's current status
 * @example <CustomerFileDetail orgId={o} workspaceId={w} fileId={id} canWrite />
 */
export function CustomerFileDetail({ orgId, workspaceId, fileId, canWrite }: CustomerFileDetailProps) {
  const query = useCustomerFile(orgId, workspaceId, fileId);
  if (query.isPending) return <Spinner label="Loading the customer file" className="flex justify-center p-6" />;
  if (query.isError) return <Alert tone="danger" title="Could not load the customer file">{errorMessage(query.error)}</Alert>;
  const file = query.data;

  switch (file.status) {
    case 'awaiting-mapping':
      return canWrite ? (
        <MappingStep orgId={orgId} workspaceId={workspaceId} file={file} />
      ) : (
        <p className="text-sm text-ink-muted">“{file.name}” is waiting for an analyst or owner to check its columns and import it.</p>
      );
    case 'importing':
      return (
        <div className="flex flex-col gap-2" aria-live="polite">
          <h3 className="text-base font-semibold text-ink">Importing “{file.name}”</h3>
          <ProgressBar
            label="Import progress"
            value={null}
            valueText={file.rowCount ? `Validating rows: ${countText(file.rowCount)} read so far…` : 'Reading and validating rows…'}
          />
          <p className="text-xs text-ink-muted">This page checks every second; you can leave it and come back.</p>
        </div>
      );
    case 'imported':
      return <ValidationReport orgId={orgId} workspaceId={workspaceId} file={file} canDownload={canWrite} />;
    case 'failed':
      return (
        <div className="flex flex-col gap-4">
          <Alert tone="danger" title={`The import of “${file.name}” failed`}>
            {file.error?.message ?? 'The server did not say why.'}
          </Alert>
          {canWrite && file.rawFileKept !== false ? (
            <MappingStep orgId={orgId} workspaceId={workspaceId} file={file} />
          ) : canWrite ? (
            <p className="text-sm text-ink-muted">Upload the file again to retry.</p>
          ) : null}
        </div>
      );
    default:
      return null;
  }
}

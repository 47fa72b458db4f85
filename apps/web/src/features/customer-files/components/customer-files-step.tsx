import { Alert } from '@demandscape/ui';
import { useState } from 'react';
import { useCustomerFiles } from '../api/get-customer-files';
import { CustomerFileDetail } from './customer-file-detail';
import { CustomerFileList } from './customer-file-list';
import { CustomerFileUpload } from './customer-file-upload';

export type CustomerFilesStepProps = {
  orgId: string;
  workspaceId: string;
  /** Owners and analysts: upload, import, delete, download rejected rows. */
  canWrite: boolean;
};

/**
 * Study step 1: upload a customer file, match its columns, import it, read the validation report; and
 * the workspace's files with delete. Readers see the list and the report counts only.
 * @param props the workspace and the viewer's rights
 * @returns the step's panel
 * @example <CustomerFilesStep orgId={orgId} workspaceId={wsId} canWrite={roleCan(role, 'customer-file:write')} />
 */
export function CustomerFilesStep({ orgId, workspaceId, canWrite }: CustomerFilesStepProps) {
  const files = useCustomerFiles(orgId, workspaceId);
  const [chosenId, setChosenId] = useState<string | null>(null);
  // Until the user picks one, show the newest file: the one just uploaded or the one in use.
  const selectedId = chosenId ?? files.data?.[0]?.id ?? null;

  return (
    <div className="flex flex-col gap-6">
      {canWrite ? (
        <CustomerFileUpload orgId={orgId} workspaceId={workspaceId} onUploaded={({ customerFile }) => setChosenId(customerFile.id)} />
      ) : (
        <Alert tone="info">
          Customer locations are personal data: you see each file’s validation counts here and the demand surfaces built from
          it, never individual customers.
        </Alert>
      )}
      {selectedId ? (
        <div className="rounded-panel border border-line p-4">
          <CustomerFileDetail key={selectedId} orgId={orgId} workspaceId={workspaceId} fileId={selectedId} canWrite={canWrite} />
        </div>
      ) : null}
      <section aria-label="Customer files in this workspace" className="flex flex-col gap-2">
        <h3 className="text-sm font-semibold text-ink">Customer files in this workspace</h3>
        <CustomerFileList
          orgId={orgId}
          workspaceId={workspaceId}
          selectedId={selectedId}
          onSelect={(file) => setChosenId(file.id)}
          canWrite={canWrite}
          onDeleted={(id) => {
            if (id === selectedId) setChosenId(null);
          }}
        />
      </section>
    </div>
  );
}

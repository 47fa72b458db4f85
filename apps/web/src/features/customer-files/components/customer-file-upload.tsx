import { Alert, FileDrop, ProgressBar } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useUploadCustomerFile, type UploadResult } from '../api/upload-customer-file';
import { byteSizeText } from '../utils/byte-size';
import { PRIVACY_LINE } from './privacy-line';

/** The server's default upload limit (UPLOAD_MAX_BYTES); a lower or higher limit is named in its 413 answer. */
export const UPLOAD_LIMIT_BYTES = 200 * 1024 * 1024;

const ACCEPTED = /\.(csv|txt|tsv|xlsx)$/i;

export type CustomerFileUploadProps = {
  orgId: string;
  workspaceId: string;
  onUploaded: (result: UploadResult) => void;
};

/**
 * Step 1a: drop or pick a CSV/XLSX file; shows the size limit, the bytes sent and the server's refusal, if any.
 * @param props the workspace and what to do with the uploaded file and its preview
 * @returns the upload panel
 * @example <CustomerFileUpload orgId={o} workspaceId={w} onUploaded={({ customerFile }) => select(customerFile.id)} />
 */
export function CustomerFileUpload({ orgId, workspaceId, onUploaded }: CustomerFileUploadProps) {
  const upload = useUploadCustomerFile(orgId, workspaceId);
  const chosen = upload.variables;

  const [refused, setRefused] = useState<string | null>(null);

  const onFile = (file: File) => {
    upload.reset();
    if (!ACCEPTED.test(file.name)) {
      setRefused(`“${file.name}” is not a customer file Demandscape can read. Choose a .csv, .tsv, .txt or .xlsx file.`);
      return;
    }
    setRefused(null);
    upload.mutate(file, { onSuccess: onUploaded });
  };

  return (
    <div className="flex flex-col gap-3">
      <FileDrop
        accept=".csv,.txt,.tsv,.xlsx"
        title="Drop a customer file here"
        pickLabel="Choose a CSV or XLSX file"
        disabled={upload.isPending}
        onFile={onFile}
      >
        <p>CSV (comma, semicolon or tab separated) or Excel XLSX, up to {byteSizeText(UPLOAD_LIMIT_BYTES)}.</p>
        <p>One row per customer with longitude and latitude in decimal degrees and, optionally, a weight.</p>
        <p className="mt-1">{PRIVACY_LINE}</p>
      </FileDrop>
      {upload.isPending && chosen ? (
        <ProgressBar
          label={`Uploading ${chosen.name}`}
          value={upload.progress ? upload.progress.loaded / Math.max(1, upload.progress.total) : null}
          valueText={
            upload.progress
              ? `Uploading ${chosen.name}: ${byteSizeText(upload.progress.loaded)} of ${byteSizeText(upload.progress.total)}`
              : `Uploading ${chosen.name}…`
          }
        />
      ) : null}
      {refused ? <Alert tone="danger" title="Wrong kind of file">{refused}</Alert> : null}
      {upload.isError ? (
        <Alert tone="danger" title={chosen ? `Could not upload ${chosen.name}` : 'Could not upload the file'}>
          {errorMessage(upload.error)}
        </Alert>
      ) : null}
    </div>
  );
}

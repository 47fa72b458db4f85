import { Alert, Button, FileDrop, Spinner } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useImportSites } from '../api/import-sites';
import { usePreviewSiteImport } from '../api/preview-site-import';
import { siteRowErrorsOf } from '../api/site-file-post';
import type { SiteImportPreview, SiteRowError } from '../types';
import { siteImportChoiceErrors, SiteImportMapping, type SiteImportChoices } from './site-import-mapping';
import { SiteRowErrors } from './site-row-errors';

export type SiteImportProps = {
  orgId: string;
  workspaceId: string;
  /** Called with how many sites were added. */
  onImported: (count: number) => void;
  onCancel: () => void;
};

const ACCEPT = '.csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/**
 * Imports sites from a CSV or XLSX file: choose it, check the guessed columns against its first rows,
 * set defaults for fields the file lacks, import. The import is all or nothing; a refused file shows
 * every bad row (row, field, problem) and keeps the file and choices for another try.
 * @param props the workspace and what to do after
 * @returns the import flow (inside a Dialog)
 * @example <SiteImport orgId={o} workspaceId={w} onImported={(n) => notify(n)} onCancel={close} />
 */
export function SiteImport({ orgId, workspaceId, onImported, onCancel }: SiteImportProps) {
  const preview = usePreviewSiteImport(orgId, workspaceId);
  const importer = useImportSites(orgId, workspaceId);
  const [file, setFile] = useState<File | null>(null);
  const [loaded, setLoaded] = useState<SiteImportPreview | null>(null);
  const [choices, setChoices] = useState<SiteImportChoices | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [rowErrors, setRowErrors] = useState<SiteRowError[] | null>(null);
  const [importError, setImportError] = useState<string | null>(null);

  const choose = (next: File) => {
    setFile(next);
    setLoaded(null);
    setRowErrors(null);
    setImportError(null);
    preview.mutate(next, {
      onSuccess: (p) => {
        setLoaded(p);
        setChoices({ mapping: p.mapping, defaultKind: 'candidate', defaultAttractiveness: '' });
        setErrors({});
      },
    });
  };

  const start = () => {
    if (!file || !choices) return;
    const problems = siteImportChoiceErrors(choices);
    setErrors(problems);
    if (Object.keys(problems).length) return;
    setRowErrors(null);
    setImportError(null);
    importer.mutate(
      {
        file,
        mapping: choices.mapping,
        defaultKind: choices.defaultKind,
        defaultAttractiveness: choices.mapping.attractiveness ? null : Number(choices.defaultAttractiveness),
      },
      {
        onSuccess: ({ imported }) => onImported(imported),
        onError: (error) => {
          const rows = siteRowErrorsOf(error);
          if (rows) setRowErrors(rows);
          else setImportError(errorMessage(error));
        },
      },
    );
  };

  if (!loaded || !choices || !file) {
    return (
      <div className="flex flex-col gap-3">
        <FileDrop accept={ACCEPT} title="Drop a sites file here" pickLabel="Choose a CSV or XLSX file" onFile={choose} disabled={preview.isPending}>
          One row per site: name, longitude, latitude and, if you have them, kind, attractiveness, its unit and notes. Up to 2 MB (5,000
          sites).
        </FileDrop>
        {preview.isPending ? <Spinner label={`Reading “${file?.name}”`} className="flex justify-center" /> : null}
        {preview.error ? (
          <Alert tone="danger" title={`“${file?.name}” could not be read`}>
            {errorMessage(preview.error)}
          </Alert>
        ) : null}
        <div className="flex justify-end">
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-muted">
        “{file.name}” ({loaded.format.toUpperCase()}, {loaded.rowCount.toLocaleString('en')} {loaded.rowCount === 1 ? 'row' : 'rows'}). We guessed the columns
        from their names; check them against the first rows and change any that are wrong.
        {loaded.missing.length ? ` No column was found for: ${loaded.missing.join(', ')}.` : ''}
      </p>
      <SiteImportMapping preview={loaded} choices={choices} onChange={setChoices} errors={errors} />
      {importError ? <Alert tone="danger">{importError}</Alert> : null}
      {rowErrors ? <SiteRowErrors errors={rowErrors} /> : null}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button variant="secondary" onClick={() => setLoaded(null)}>
          Choose another file
        </Button>
        <Button onClick={start} isLoading={importer.isPending}>
          Import {loaded.rowCount.toLocaleString('en')} {loaded.rowCount === 1 ? 'site' : 'sites'}
        </Button>
      </div>
    </div>
  );
}

import { Alert, Badge, Button, Field, Select, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import {
  importCustomerFileInputSchema,
  useImportCustomerFile,
  type ImportCustomerFileInput,
} from '../api/import-customer-file';
import type { CustomerFile, CustomerFilePreview, WeightKind } from '../types';
import { PreviewTable } from './preview-table';
import { PRIVACY_LINE } from './privacy-line';

const weightKinds: { value: WeightKind; label: string; hint: string; defaultLabel: string }[] = [
  { value: 'count', label: 'Count of customers', hint: 'Each row counts once (or by the number in the weight column).', defaultLabel: 'customers' },
  { value: 'spend', label: 'Spend', hint: 'Money per customer, e.g. annual spend; the surface shows spend per km².', defaultLabel: 'annual spend (€)' },
  { value: 'visits', label: 'Visits', hint: 'Visits or transactions per customer.', defaultLabel: 'visits per year' },
  { value: 'other', label: 'Other', hint: 'Any other non-negative amount; name it in the label.', defaultLabel: '' },
];

export type ColumnMappingFormProps = {
  orgId: string;
  workspaceId: string;
  file: CustomerFile;
  preview: CustomerFilePreview;
  onImportStarted: (file: CustomerFile | null) => void;
};

/**
 * Step 1b: choose which columns hold longitude, latitude and (optionally) the weight, pre-filled from
 * what the server detected; name the weight; decide on flagged outliers; start the import.
 * @param props the workspace, the uploaded file, its preview and what to do once the import starts
 * @returns the form with the preview table
 * @example <ColumnMappingForm orgId={o} workspaceId={w} file={f} preview={p} onImportStarted={refresh} />
 */
export function ColumnMappingForm({ orgId, workspaceId, file, preview, onImportStarted }: ColumnMappingFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const known = (name: string | undefined) => (name && preview.columns.includes(name) ? name : '');
  const defaults: ImportCustomerFileInput = {
      lon: known(file.mapping?.lon ?? preview.detected.lon),
      lat: known(file.mapping?.lat ?? preview.detected.lat),
      weight: known(file.mapping?.weight ?? preview.detected.weight),
      weightKind: file.weightKind ?? (preview.detected.weight ? 'spend' : 'count'),
      weightLabel: file.weightLabel ?? '',
      excludeFlagged: file.excludeFlagged,
  };
  const form = useForm<ImportCustomerFileInput>({ resolver: zodResolver(importCustomerFileInputSchema), defaultValues: defaults });
  const mutation = useImportCustomerFile(orgId, workspaceId, file.id);
  const { errors } = form.formState;
  const [lon, lat, weight, weightKind] = form.watch(['lon', 'lat', 'weight', 'weightKind']);
  const kind = weightKinds.find((k) => k.value === weightKind) ?? weightKinds[0]!;

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: onImportStarted,
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['lon', 'lat', 'weight', 'weightKind', 'weightLabel'])) {
          setFormError(errorMessage(error));
        }
      },
    });
  });

  const detectedNote = [
    preview.detected.delimiter ? `separator “${preview.detected.delimiter === '\t' ? 'tab' : preview.detected.delimiter}”` : null,
    preview.detected.decimalComma ? 'decimal comma' : null,
    preview.detected.encoding ? `encoding ${preview.detected.encoding}` : null,
    preview.detected.hasHeader === false ? 'no header row (columns are numbered)' : null,
  ].filter(Boolean);

  const columnOptions = (
    <>
      {preview.columns.map((c) => (
        <option key={c} value={c}>
          {c}
        </option>
      ))}
    </>
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Column mapping">
      <div>
        <h3 className="text-base font-semibold text-ink">Match the columns of “{file.name}”</h3>
        <p className="text-sm text-ink-muted">
          We guessed the columns from their names and values{detectedNote.length ? ` (${detectedNote.join(', ')})` : ''}. Check
          them against the first rows below and change any that are wrong.
        </p>
      </div>
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <div className="grid gap-4 md:grid-cols-3">
        <Field label="Longitude column" hint="East–west position in decimal degrees (−180 to 180)." error={errors.lon?.message}>
          {(p) => (
            <Select {...p} defaultValue={defaults.lon} {...form.register('lon')}>
              <option value="">Choose a column…</option>
              {columnOptions}
            </Select>
          )}
        </Field>
        <Field label="Latitude column" hint="North–south position in decimal degrees (−90 to 90)." error={errors.lat?.message}>
          {(p) => (
            <Select {...p} defaultValue={defaults.lat} {...form.register('lat')}>
              <option value="">Choose a column…</option>
              {columnOptions}
            </Select>
          )}
        </Field>
        <Field
          label="Weight column (optional)"
          hint="How much each customer counts, e.g. annual spend. Without one, every customer counts 1."
          error={errors.weight?.message}
        >
          {(p) => (
            <Select {...p} defaultValue={defaults.weight} {...form.register('weight')}>
              <option value="">No weight: every customer counts 1</option>
              {columnOptions}
            </Select>
          )}
        </Field>
      </div>
      <div className="grid gap-4 md:grid-cols-3">
        <Field label="The weight is" hint={kind.hint} error={errors.weightKind?.message}>
          {(p) => (
            <Select {...p} defaultValue={defaults.weightKind} {...form.register('weightKind')}>
              {weightKinds.map((k) => (
                <option key={k.value} value={k.value}>
                  {k.label}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <TextField
          label="Weight label (optional)"
          placeholder={kind.defaultLabel || 'e.g. orders per year'}
          hint="Shown in the legend, e.g. “annual spend (€) per km²”."
          error={errors.weightLabel?.message}
          {...form.register('weightLabel')}
        />
        <label className="flex items-start gap-2 pt-7 text-sm text-ink">
          <input type="checkbox" className="mt-0.5 size-4 accent-accent" {...form.register('excludeFlagged')} />
          <span>
            Exclude flagged outliers
            <span className="block text-xs text-ink-muted">
              Leave out points far from all other customers (often geocoding errors). Off by default: flagged rows are kept
              and counted in the report.
            </span>
          </span>
        </label>
      </div>
      <PreviewTable preview={preview} mapping={{ lon, lat, weight }} />
      <p className="text-sm text-ink-muted">
        <Badge tone="accent" className="mr-2">
          Privacy
        </Badge>
        {PRIVACY_LINE}
      </p>
      <div className="flex justify-end">
        <Button type="submit" isLoading={mutation.isPending}>
          Import
        </Button>
      </div>
    </form>
  );
}

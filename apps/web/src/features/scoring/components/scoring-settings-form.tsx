import { Alert, Button, Field, Input, Select, Spinner } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type UseFormReturn } from 'react-hook-form';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useScoringSettings } from '../api/get-scoring-settings';
import {
  scoringSettingsBodyFrom,
  scoringSettingsFormSchema,
  scoringSettingsFormValues,
  useUpdateScoringSettings,
  type ScoringSettingsFormValues,
} from '../api/update-scoring-settings';
import type { ScoringSettingsJson } from '../types';
import { measureLabel, measureOptions, settingExplanations } from '../utils/scoring-explanations';
import { RadiiEditor } from './radii-editor';

export type ScoringSettingsFormProps = { orgId: string; workspaceId: string; canWrite: boolean };

type FormField = 'alpha' | 'beta' | 'radii' | 'radiusUnit' | 'measure' | 'minDistance';

// The API names fields after its body (minDistanceM, radii.2); the form after its inputs.
function formFieldOf(apiField: string): { name: FormField | `radii.${number}.value`; root?: boolean } | null {
  const ring = /^radii\.(\d+)$/.exec(apiField);
  if (ring) return { name: `radii.${Number(ring[1])}.value` };
  if (apiField === 'minDistanceM') return { name: 'minDistance' };
  if (['alpha', 'beta', 'radiusUnit', 'measure'].includes(apiField)) return { name: apiField as FormField };
  if (apiField === 'radii') return { name: 'radii', root: true };
  return null;
}

// Places every field error the server listed (`fields`, or the single `field`); false when none fits a field.
function fieldErrorsPlaced(error: unknown, form: UseFormReturn<ScoringSettingsFormValues>): boolean {
  if (!(error instanceof ApiError)) return false;
  const listed = error.fields ?? (error.field ? { [error.field]: error.message } : {});
  let placed = 0;
  for (const [apiField, message] of Object.entries(listed)) {
    const target = formFieldOf(apiField);
    if (!target) continue;
    if (target.root) form.setError('radii', { type: 'server', message });
    else form.setError(target.name, { type: 'server', message }, { shouldFocus: placed === 0 });
    placed += 1;
  }
  return placed > 0;
}

function SettingsEditor({ orgId, workspaceId, settings }: { orgId: string; workspaceId: string; settings: ScoringSettingsJson }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<ScoringSettingsFormValues>({ resolver: zodResolver(scoringSettingsFormSchema), defaultValues: scoringSettingsFormValues(settings) });
  const save = useUpdateScoringSettings(orgId, workspaceId);
  const { errors } = form.formState;
  const radii = form.watch('radii');
  const unit = form.watch('radiusUnit');

  const submit = form.handleSubmit((values) => {
    setFormError(null);
    setSaved(false);
    save.mutate(scoringSettingsBodyFrom(values), {
      onSuccess: (next) => {
        form.reset(scoringSettingsFormValues(next));
        setSaved(true);
      },
      onError: (error) => {
        if (!fieldErrorsPlaced(error, form)) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Scoring settings" className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <div className="grid gap-4 md:grid-cols-2">
        <Field label="Attractiveness exponent α" hint={settingExplanations.alpha} error={errors.alpha?.message}>
          {(p) => <Input {...p} inputMode="decimal" className="tabular-nums" {...form.register('alpha')} />}
        </Field>
        <Field label="Distance decay β" hint={settingExplanations.beta} error={errors.beta?.message}>
          {(p) => <Input {...p} inputMode="decimal" className="tabular-nums" {...form.register('beta')} />}
        </Field>
      </div>
      <RadiiEditor form={form} />
      <div className="grid gap-4 md:grid-cols-2">
        <Field label="Rank candidates by" hint={settingExplanations.measure} error={errors.measure?.message}>
          {(p) => (
            <Select {...p} {...form.register('measure')}>
              {measureOptions.map((m) => (
                <option key={m.value} value={m.value}>
                  {m.label}
                </option>
              ))}
              {radii.map((r, i) => (
                <option key={i} value={`ring:${i}`}>
                  Demand within {r.value || '?'} {unit}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Minimum distance (m)" hint={settingExplanations.minDistance} error={errors.minDistance?.message}>
          {(p) => <Input {...p} inputMode="decimal" placeholder="half a cell" className="tabular-nums" {...form.register('minDistance')} />}
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" isLoading={save.isPending}>
          Save settings
        </Button>
        {saved ? <span className="text-sm text-success">Saved; the next scoring run uses them.</span> : null}
        <span className="text-xs text-ink-faint">
          {settings.isDefault || !settings.updatedAt
            ? 'Suggested defaults (not saved yet).'
            : `Saved ${dateTimeText(settings.updatedAt)}${settings.updatedBy ? ` by ${settings.updatedBy.name}` : ''}.`}
        </span>
      </div>
    </form>
  );
}

function SettingsSummary({ settings }: { settings: ScoringSettingsJson }) {
  const measure = measureLabel(
    settings.measure,
    settings.radii.map((r) => `${r} ${settings.radiusUnit}`),
  );
  return (
    <dl aria-label="Scoring settings" className="grid gap-x-6 gap-y-1 text-sm tabular-nums sm:grid-cols-[auto_1fr]">
      <dt className="text-ink-muted">Attractiveness exponent α</dt>
      <dd>{settings.alpha}</dd>
      <dt className="text-ink-muted">Distance decay β</dt>
      <dd>{settings.beta}</dd>
      <dt className="text-ink-muted">Ring radii</dt>
      <dd>{settings.radii.map((r) => `${r} ${settings.radiusUnit}`).join(', ')}</dd>
      <dt className="text-ink-muted">Rank candidates by</dt>
      <dd>{measure}</dd>
      <dt className="text-ink-muted">Minimum distance</dt>
      <dd>{settings.minDistanceM === null ? 'half a cell' : `${settings.minDistanceM} m`}</dd>
    </dl>
  );
}

/**
 * The workspace's scoring settings: an editable form for owners and planners (α, β, rings, measure,
 * minimum distance, each with its one-line explanation), a read-only summary for everyone else.
 * @param props the workspace and whether the viewer may change the settings
 * @returns the form, the summary, or their loading / error state
 * @example <ScoringSettingsForm orgId={o} workspaceId={w} canWrite />
 */
export function ScoringSettingsForm({ orgId, workspaceId, canWrite }: ScoringSettingsFormProps) {
  const settings = useScoringSettings(orgId, workspaceId);
  if (settings.isPending) return <Spinner label="Loading the scoring settings" className="flex justify-center p-4" />;
  if (settings.isError) {
    return (
      <Alert tone="danger" title="Could not load the scoring settings">
        {errorMessage(settings.error)}
      </Alert>
    );
  }
  if (!canWrite) return <SettingsSummary settings={settings.data} />;
  return <SettingsEditor orgId={orgId} workspaceId={workspaceId} settings={settings.data} />;
}

import { Button, Input } from '@demandscape/ui';
import { useFieldArray, type UseFormReturn } from 'react-hook-form';
import type { ScoringSettingsFormValues } from '../api/update-scoring-settings';
import { radiiConverted } from '../utils/radius-units';
import { settingExplanations } from '../utils/scoring-explanations';

export type RadiiEditorProps = { form: UseFormReturn<ScoringSettingsFormValues>; disabled?: boolean };

/**
 * The ring radii as a list (1–5 rings, add and remove) with a km / miles toggle that converts what is typed.
 * @param props the settings form
 * @returns the fieldset
 * @example <RadiiEditor form={form} />
 */
export function RadiiEditor({ form, disabled = false }: RadiiEditorProps) {
  const radii = useFieldArray({ control: form.control, name: 'radii' });
  const unit = form.watch('radiusUnit');
  const { errors } = form.formState;
  const listError = errors.radii?.root?.message ?? errors.radii?.message;

  const switchUnit = (to: 'km' | 'mi') => {
    if (to === unit) return;
    const converted = radiiConverted(form.getValues('radii').map((r) => r.value), unit, to);
    converted.forEach((value, i) => form.setValue(`radii.${i}.value`, value));
    form.setValue('radiusUnit', to);
  };

  return (
    <fieldset className="flex flex-col gap-2" disabled={disabled}>
      <legend className="text-sm font-medium text-ink">Ring radii</legend>
      <div role="group" aria-label="Radius unit" className="flex w-fit overflow-hidden rounded-control border border-line-strong text-sm">
        {(['km', 'mi'] as const).map((u) => (
          <button
            key={u}
            type="button"
            aria-pressed={unit === u}
            onClick={() => switchUnit(u)}
            className={unit === u ? 'bg-accent px-3 py-1 text-on-accent' : 'bg-surface px-3 py-1 text-ink hover:bg-sunken'}
          >
            {u === 'km' ? 'Kilometres' : 'Miles'}
          </button>
        ))}
      </div>
      <ol className="flex flex-col gap-2">
        {radii.fields.map((field, i) => {
          const error = errors.radii?.[i]?.value?.message;
          return (
            <li key={field.id} className="flex flex-col gap-1">
              <div className="flex items-center gap-2">
                <Input
                  aria-label={`Ring ${i + 1} radius (${unit})`}
                  aria-invalid={error ? true : undefined}
                  inputMode="decimal"
                  className="w-28 tabular-nums"
                  {...form.register(`radii.${i}.value`)}
                />
                <span className="text-sm text-ink-muted">{unit}</span>
                {radii.fields.length > 1 ? (
                  <Button size="sm" variant="ghost" onClick={() => radii.remove(i)} aria-label={`Remove ring ${i + 1}`}>
                    Remove
                  </Button>
                ) : null}
              </div>
              {error ? (
                <p className="text-sm text-danger" role="alert">
                  {error}
                </p>
              ) : null}
            </li>
          );
        })}
      </ol>
      {radii.fields.length < 5 ? (
        <Button size="sm" variant="secondary" className="w-fit" onClick={() => radii.append({ value: '' })}>
          Add a ring
        </Button>
      ) : null}
      {listError ? (
        <p className="text-sm text-danger" role="alert">
          {listError}
        </p>
      ) : null}
      <p className="text-xs text-ink-muted">{settingExplanations.radii}</p>
    </fieldset>
  );
}

import { Alert, Button, Field, FileDrop, Input, Select, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { surfaceFormSchema, useCreateSurface, type SurfaceFormValues } from '../api/create-surface';
import { useSurfaceEstimate } from '../api/estimate-surface';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import type { StudyArea, Surface, SurfaceSource } from '../types';
import { studyAreaFromGeoJson } from '../utils/study-area-geojson';
import { surfaceBodyFrom } from '../utils/surface-body';
import { CAUTION_LINE, explanations, kernelOptions, methodOptions, ruleOptions } from '../utils/surface-explanations';
import { EstimatePanel } from './estimate-panel';
import { ToggleField } from './toggle-field';

/** Quiet time before the estimate is asked again, in milliseconds. */
export const ESTIMATE_DEBOUNCE_MS = 400;

type Polygon = Extract<StudyArea, { type: 'polygon' }>['geometry'];

export type SurfaceFormProps = {
  orgId: string;
  workspaceId: string;
  /** Imported customer files to build from. */
  sources: SurfaceSource[];
  onCreated: (surface: Surface) => void;
};

/**
 * Study step 2: the demand-surface settings, each with a one-line explanation, and the live estimate
 * (bandwidth, grid, credits, warnings) that follows every change; Start queues the run.
 * @param props the workspace, the imported files and what to do with the queued run
 * @returns the form and the estimate
 * @example <SurfaceForm orgId={o} workspaceId={w} sources={files} onCreated={(s) => select(s.id)} />
 */
export function SurfaceForm({ orgId, workspaceId, sources, onCreated }: SurfaceFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [polygon, setPolygon] = useState<{ name: string; geometry: Polygon } | null>(null);
  const [polygonError, setPolygonError] = useState<string | null>(null);
  const form = useForm<SurfaceFormValues>({
    resolver: zodResolver(surfaceFormSchema),
    defaultValues: {
      customerFileId: sources[0]?.id ?? '',
      name: '',
      kernel: 'quartic',
      bandwidthMode: 'rule',
      rule: 'normal-reference',
      bandwidthValue: '',
      cellSize: '',
      studyAreaType: 'extent',
      edgeCorrection: false,
      adaptive: false,
      unit: 'km2',
      method: 'auto',
    },
  });
  const { errors } = form.formState;
  const values = form.watch();
  const bodyText = JSON.stringify(surfaceBodyFrom(values, polygon?.geometry ?? null));
  const settledText = useDebouncedValue(bodyText, ESTIMATE_DEBOUNCE_MS);
  const settledBody = useMemo(() => JSON.parse(settledText) as ReturnType<typeof surfaceBodyFrom>, [settledText]);
  const estimate = useSurfaceEstimate(orgId, workspaceId, settledBody);
  const create = useCreateSurface(orgId, workspaceId);

  const kernel = kernelOptions.find((k) => k.value === values.kernel) ?? kernelOptions[0]!;
  const rule = ruleOptions.find((r) => r.value === values.rule) ?? ruleOptions[0]!;
  const method = methodOptions.find((m) => m.value === values.method) ?? methodOptions[0];
  const current = estimate.data && settledText === bodyText ? estimate.data : undefined;

  const onPolygonFile = async (file: File) => {
    setPolygonError(null);
    try {
      setPolygon({ name: file.name, geometry: studyAreaFromGeoJson(await file.text()) });
    } catch (err) {
      setPolygon(null);
      setPolygonError(errorMessage(err));
    }
  };

  const submit = form.handleSubmit((v) => {
    setFormError(null);
    const body = surfaceBodyFrom(v, polygon?.geometry ?? null);
    if (!body) {
      setFormError('Upload the study-area polygon (GeoJSON) or choose “The customers’ extent”.');
      return;
    }
    create.mutate(body, {
      onSuccess: onCreated,
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['customerFileId', 'name', 'cellSize'])) setFormError(errorMessage(error));
      },
    });
  });

  if (sources.length === 0) {
    return (
      <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">
        Import a customer file in step 1 first; the surface is built from its coordinates and weights.
      </p>
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-label="New demand surface" className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="flex flex-col gap-4">
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <div className="grid gap-4 md:grid-cols-2">
          <Field label="Customer file" hint={explanations.customerFile} error={errors.customerFileId?.message}>
            {(p) => (
              <Select {...p} defaultValue={form.formState.defaultValues?.customerFileId} {...form.register('customerFileId')}>
                {sources.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name} ({s.acceptedCount.toLocaleString('en')} customers{s.weightLabel ? `, ${s.weightLabel}` : ''})
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <TextField label="Name (optional)" hint={explanations.name} error={errors.name?.message} {...form.register('name')} />
        </div>

        <Field label="Kernel" hint={`${kernel.explanation} ${explanations.kernel}`}>
          {(p) => (
            <Select {...p} defaultValue="quartic" {...form.register('kernel')}>
              {kernelOptions.map((k) => (
                <option key={k.value} value={k.value}>
                  {k.label}
                </option>
              ))}
            </Select>
          )}
        </Field>

        <fieldset className="flex flex-col gap-3">
          <legend className="text-sm font-medium text-ink">Bandwidth</legend>
          <p className="text-xs text-ink-muted">{explanations.bandwidth}</p>
          <div className="flex flex-wrap gap-4 text-sm">
            <label className="flex items-center gap-2">
              <input type="radio" value="rule" className="accent-accent" {...form.register('bandwidthMode')} /> Suggested by a rule
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="value" className="accent-accent" {...form.register('bandwidthMode')} /> Set by hand
            </label>
          </div>
          {values.bandwidthMode === 'rule' ? (
            <Field label="Rule" hint={current ? `${rule.explanation} Result: ${current.bandwidth.explanation}` : rule.explanation}>
              {(p) => (
                <Select {...p} defaultValue="normal-reference" {...form.register('rule')}>
                  {ruleOptions.map((r) => (
                    <option key={r.value} value={r.value}>
                      {r.label}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
          ) : (
            <div className="grid gap-4 md:grid-cols-[12rem_minmax(0,1fr)] md:items-start">
              <Field label="Bandwidth (m)" hint={explanations.bandwidthValue} error={errors.bandwidthValue?.message}>
                {(p) => <Input {...p} inputMode="decimal" placeholder="e.g. 800" {...form.register('bandwidthValue')} />}
              </Field>
              {current ? (
                <p className="pt-7 text-sm text-ink tabular-nums" aria-live="polite">
                  Gaussian sd {Math.round(current.bandwidth.gaussianSd).toLocaleString('en')} m · kernel radius{' '}
                  {Math.round(current.bandwidth.radius).toLocaleString('en')} m
                </p>
              ) : null}
            </div>
          )}
        </fieldset>

        <Field
          label="Cell size (m)"
          hint={current ? `${explanations.cellSize} Suggested: ${current.cellSize.explanation}` : explanations.cellSize}
          error={errors.cellSize?.message}
        >
          {(p) => (
            <Input
              {...p}
              inputMode="decimal"
              placeholder={current ? `${Math.round(current.cellSize.value)} (suggested)` : 'suggested'}
              {...form.register('cellSize')}
            />
          )}
        </Field>

        <fieldset className="flex flex-col gap-2">
          <legend className="text-sm font-medium text-ink">Study area</legend>
          <p className="text-xs text-ink-muted">{explanations.studyArea}</p>
          <div className="flex flex-wrap gap-4 text-sm">
            <label className="flex items-center gap-2">
              <input type="radio" value="extent" className="accent-accent" {...form.register('studyAreaType')} /> The customers’ extent
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="polygon" className="accent-accent" {...form.register('studyAreaType')} /> A polygon from a GeoJSON file
            </label>
          </div>
          {values.studyAreaType === 'polygon' ? (
            <>
              <FileDrop accept=".geojson,.json" title="Drop the study-area polygon here" pickLabel="Choose a GeoJSON file" onFile={(f) => void onPolygonFile(f)}>
                A Polygon or MultiPolygon (or features holding them) in longitude/latitude.
              </FileDrop>
              {polygon ? (
                <p className="text-sm text-success">
                  Study area from “{polygon.name}” ({polygon.geometry.type === 'Polygon' ? '1 polygon' : `${polygon.geometry.coordinates.length} polygons`}).
                </p>
              ) : null}
              {polygonError ? <Alert tone="danger" title="Could not use that file">{polygonError}</Alert> : null}
            </>
          ) : null}
        </fieldset>

        <div className="grid gap-4 md:grid-cols-2">
          <Field label="Unit" hint={explanations.unit}>
            {(p) => (
              <Select {...p} defaultValue="km2" {...form.register('unit')}>
                <option value="km2">per km²</option>
                <option value="sqmi">per sq mi</option>
              </Select>
            )}
          </Field>
          <Field label="Method" hint={`${method.explanation} ${explanations.method}`}>
            {(p) => (
              <Select {...p} defaultValue="auto" {...form.register('method')}>
                {methodOptions.map((m) => (
                  <option key={m.value} value={m.value}>
                    {m.label}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        </div>
        <div className="grid gap-4 md:grid-cols-2">
          <ToggleField label="Edge correction" hint={explanations.edgeCorrection} {...form.register('edgeCorrection')} />
          <ToggleField label="Adaptive bandwidth" hint={explanations.adaptive} {...form.register('adaptive')} />
        </div>
      </div>

      <aside className="flex flex-col gap-4 rounded-panel border border-line bg-sunken/60 p-4">
        <h3 className="text-sm font-semibold text-ink">Before it runs</h3>
        <EstimatePanel
          estimate={current ?? estimate.data}
          error={settledBody ? estimate.error : null}
          isFetching={estimate.isFetching || settledText !== bodyText}
          incomplete={!settledBody}
          onUseCellSize={(m) => form.setValue('cellSize', String(m), { shouldValidate: true })}
        />
        <p className="text-xs text-ink-muted">{CAUTION_LINE}</p>
        <Button type="submit" isLoading={create.isPending} disabled={Boolean(estimate.error)}>
          {current ? `Start (${current.cost.credits.toLocaleString('en')} ${current.cost.credits === 1 ? 'credit' : 'credits'})` : 'Start'}
        </Button>
      </aside>
    </form>
  );
}

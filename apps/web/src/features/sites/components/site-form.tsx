import { Alert, Button, Field, Select, TextAreaField, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { siteFormSchema, siteInputFrom, useCreateSite, type SiteFormValues } from '../api/create-site';
import { useUpdateSite } from '../api/update-site';
import type { Site, SitePick } from '../types';
import { degreesText, siteExplanations, siteKindOrder, siteKindWords } from '../utils/site-explanations';

export type SiteFormProps = {
  orgId: string;
  workspaceId: string;
  /** The site to edit, as stored now (a move elsewhere updates the form's position); without it the form adds a new one. */
  site?: Site;
  /** The last position clicked on the map; each new click fills longitude and latitude. */
  picked: SitePick | null;
  /** The unit the study's other sites use, offered for a new site. */
  defaultLabel?: string;
  onDone: (site: Site) => void;
  onCancel: () => void;
};

const fieldNames = ['kind', 'name', 'lon', 'lat', 'attractiveness', 'attractivenessLabel', 'notes'] as const;

function valuesOf(site: Site | undefined, picked: SitePick | null, defaultLabel: string): SiteFormValues {
  return {
    kind: site?.kind ?? 'candidate',
    name: site?.name ?? '',
    lon: site ? degreesText(site.lon) : picked ? degreesText(picked.lon) : '',
    lat: site ? degreesText(site.lat) : picked ? degreesText(picked.lat) : '',
    attractiveness: site ? String(site.attractiveness) : '',
    attractivenessLabel: site?.attractivenessLabel ?? defaultLabel,
    notes: site?.notes ?? '',
  };
}

/**
 * Adds or edits a site: kind, name, position (typed, or filled by a click on the map), attractiveness
 * and its unit, notes. Each field says in one line what it means.
 * @param props the workspace, the site to edit (if any), the map's last pick and what to do after
 * @returns the form
 * @example <SiteForm orgId={o} workspaceId={w} picked={pick} onDone={select} onCancel={close} />
 */
export function SiteForm({ orgId, workspaceId, site, picked, defaultLabel = '', onDone, onCancel }: SiteFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [defaults] = useState(() => valuesOf(site, picked, defaultLabel));
  const form = useForm<SiteFormValues>({ resolver: zodResolver(siteFormSchema), defaultValues: defaults });
  const create = useCreateSite(orgId, workspaceId);
  const update = useUpdateSite(orgId, workspaceId, { inline: true });
  const { errors } = form.formState;

  // A click on the map (a new pick) moves the form's position there.
  const [seenSeq, setSeenSeq] = useState(picked?.seq ?? null);
  useEffect(() => {
    if (!picked || picked.seq === seenSeq) return;
    setSeenSeq(picked.seq);
    form.setValue('lon', degreesText(picked.lon), { shouldValidate: true, shouldDirty: true });
    form.setValue('lat', degreesText(picked.lat), { shouldValidate: true, shouldDirty: true });
  }, [picked, seenSeq, form]);

  // The site moved elsewhere (dragged on the map) while the form is open: the form follows, so saving
  // does not put it back where it was.
  const [seenAt, setSeenAt] = useState(site ? `${site.lon},${site.lat}` : null);
  useEffect(() => {
    if (!site) return;
    const at = `${site.lon},${site.lat}`;
    if (at === seenAt) return;
    setSeenAt(at);
    form.setValue('lon', degreesText(site.lon), { shouldValidate: true });
    form.setValue('lat', degreesText(site.lat), { shouldValidate: true });
  }, [site, seenAt, form]);

  const onError = (error: Error) => {
    if (!serverErrorsOnFields(error, form.setError, fieldNames)) setFormError(errorMessage(error));
  };
  const submit = form.handleSubmit((values) => {
    setFormError(null);
    const input = siteInputFrom(values);
    if (site) update.mutate({ siteId: site.id, changes: input }, { onSuccess: onDone, onError });
    else create.mutate(input, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label={site ? `Edit ${site.name}` : 'New site'}>
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <div className="grid gap-4 md:grid-cols-2">
        <Field label="Kind" hint={siteExplanations.kind} error={errors.kind?.message}>
          {(p) => (
            <Select {...p} defaultValue={defaults.kind} {...form.register('kind')}>
              {siteKindOrder.map((kind) => (
                <option key={kind} value={kind}>
                  {siteKindWords[kind].one}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <TextField label="Name" hint={siteExplanations.name} error={errors.name?.message} placeholder="e.g. Quay corner" {...form.register('name')} />
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <TextField label="Longitude" inputMode="decimal" hint={siteExplanations.lon} error={errors.lon?.message} placeholder="e.g. -38.5123" {...form.register('lon')} />
        <TextField label="Latitude" inputMode="decimal" hint={siteExplanations.lat} error={errors.lat?.message} placeholder="e.g. 44.5091" {...form.register('lat')} />
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <TextField
          label="Attractiveness"
          inputMode="decimal"
          hint={siteExplanations.attractiveness}
          error={errors.attractiveness?.message}
          placeholder="e.g. 180"
          {...form.register('attractiveness')}
        />
        <TextField
          label="Attractiveness unit (optional)"
          hint={siteExplanations.attractivenessLabel}
          error={errors.attractivenessLabel?.message}
          placeholder="e.g. m² sales floor"
          {...form.register('attractivenessLabel')}
        />
      </div>
      <TextAreaField label="Notes (optional)" rows={2} hint={siteExplanations.notes} error={errors.notes?.message} {...form.register('notes')} />
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" isLoading={create.isPending || update.isPending}>
          {site ? 'Save changes' : 'Add site'}
        </Button>
      </div>
    </form>
  );
}

import { Alert, Button, Field, Input, Select } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useCreateScoringRun } from '../api/create-scoring-run';
import type { ScoringRunJson, ScoringSurfaceOption } from '../types';

export type ScoreSitesFormProps = {
  orgId: string;
  workspaceId: string;
  /** Finished demand surfaces, newest first. */
  surfaces: ScoringSurfaceOption[];
  onStarted: (run: ScoringRunJson) => void;
};

/**
 * Starts a scoring run: every candidate against the chosen finished surface, with the saved settings.
 * @param props the workspace, the finished surfaces and what to do with the queued run
 * @returns the form, or a note when there is no finished surface
 * @example <ScoreSitesForm orgId={o} workspaceId={w} surfaces={done} onStarted={(r) => choose(r.id)} />
 */
export function ScoreSitesForm({ orgId, workspaceId, surfaces, onStarted }: ScoreSitesFormProps) {
  const [surfaceId, setSurfaceId] = useState(surfaces[0]?.id ?? '');
  const [name, setName] = useState('');
  const create = useCreateScoringRun(orgId, workspaceId);
  const chosen = surfaces.some((s) => s.id === surfaceId) ? surfaceId : (surfaces[0]?.id ?? '');

  if (surfaces.length === 0) {
    return (
      <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">
        Build a demand surface in step 2 first; candidates are scored against a finished surface.
      </p>
    );
  }

  return (
    <form
      aria-label="Score sites"
      noValidate
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        create.mutate({ surfaceId: chosen, ...(name.trim() ? { name: name.trim() } : {}) }, { onSuccess: onStarted });
      }}
    >
      <div className="grid gap-4 md:grid-cols-2">
        <Field label="Demand surface" hint="The finished surface whose demand the candidates compete for.">
          {(p) => (
            <Select {...p} value={chosen} onChange={(e) => setSurfaceId(e.target.value)}>
              {surfaces.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Run name (optional)" hint="Otherwise the surface and the date name the run.">
          {(p) => <Input {...p} value={name} maxLength={120} onChange={(e) => setName(e.target.value)} />}
        </Field>
      </div>
      {create.error ? (
        <Alert tone="danger" title="Could not start scoring">
          {errorMessage(create.error)}
        </Alert>
      ) : null}
      <Button type="submit" className="w-fit" isLoading={create.isPending}>
        Score sites
      </Button>
    </form>
  );
}

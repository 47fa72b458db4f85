import { Alert, Button, Field, Select, Spinner, TextField } from '@demandscape/ui';
import { useMemo, useState, type FormEvent } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { shortlistDraftSchema, type ShortlistDraft } from '../api/create-shortlist';
import { useShortlistRun, useShortlistRuns } from '../api/get-scoring-runs';
import { draftItemToggle, type DraftItem } from '../utils/draft-items';
import { DraftItemsEditor } from './draft-items-editor';
import { RunRankingPicker } from './run-ranking-picker';

export type ShortlistBuilderProps = {
  orgId: string;
  workspaceId: string;
  /** `create` asks for a name; `version` saves the edits as the shortlist's next version. */
  mode: 'create' | 'version';
  /** Where to start: the viewed version's run, sites, order and notes (new shortlists start empty). */
  initial?: { runId: string; items: DraftItem[] };
  isSaving: boolean;
  /** What the last save attempt threw (shown by the field it names, or above the buttons). */
  saveError: unknown;
  onSave: (draft: ShortlistDraft) => void;
  onCancel: () => void;
};

type Problems = Partial<Record<'name' | 'scoringRunId' | 'items' | 'versionNote', string>>;

/**
 * Builds a shortlist from a finished scoring run: choose the run, tick sites in its ranking, put them in
 * order with a note each, then name the shortlist and describe the version before saving.
 * @param props the workspace, the mode, the starting point and the save handlers
 * @returns the builder form
 * @example <ShortlistBuilder orgId={o} workspaceId={w} mode="create" isSaving={m.isPending} saveError={m.error} onSave={save} onCancel={close} />
 */
export function ShortlistBuilder({ orgId, workspaceId, mode, initial, isSaving, saveError, onSave, onCancel }: ShortlistBuilderProps) {
  const runs = useShortlistRuns(orgId, workspaceId);
  const finished = useMemo(() => (runs.data ?? []).filter((r) => r.status === 'succeeded'), [runs.data]);
  const [chosenRunId, setChosenRunId] = useState<string | null>(initial?.runId ?? null);
  const runId = chosenRunId ?? finished[0]?.id ?? '';
  const run = useShortlistRun(orgId, workspaceId, runId);
  const [items, setItems] = useState<DraftItem[]>(initial?.items ?? []);
  const [name, setName] = useState('');
  const [versionNote, setVersionNote] = useState('');
  const [problems, setProblems] = useState<Problems>({});

  const runSiteIds = useMemo(() => (run.data ? new Set((run.data.results?.candidates ?? []).map((c) => c.siteId)) : null), [run.data]);
  const chosenIds = useMemo(() => new Set(items.map((i) => i.siteId)), [items]);
  const serverField = saveError instanceof ApiError ? saveError.field : undefined;
  const serverProblem = saveError && serverField !== 'name' ? errorMessage(saveError) : null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const kept = runSiteIds ? items.filter((i) => runSiteIds.has(i.siteId)) : items;
    const parsed = shortlistDraftSchema.safeParse({ name: mode === 'create' ? name : 'version', scoringRunId: runId, items: kept, versionNote });
    if (!parsed.success) {
      const found: Problems = {};
      for (const issue of parsed.error.issues) {
        const key = issue.path[0] as keyof Problems;
        found[key] ??= issue.message;
      }
      setProblems(found);
      return;
    }
    setProblems({});
    onSave(parsed.data);
  };

  if (runs.isPending) return <Spinner label="Loading scoring runs" className="flex justify-center p-6" />;
  if (runs.isError) return <Alert tone="danger" title="Could not load the scoring runs">{errorMessage(runs.error)}</Alert>;
  if (finished.length === 0) {
    return (
      <div className="flex flex-col gap-3">
        <Alert tone="info" title="No finished scoring run yet">
          A shortlist is built from a ranking. Score the sites in step 3 first, then come back here.
        </Alert>
        <Button variant="ghost" className="w-fit" onClick={onCancel}>
          Back
        </Button>
      </div>
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-label={mode === 'create' ? 'New shortlist' : 'New version'} className="flex flex-col gap-5">
      <Field label="Scoring run" hint="The ranking the shortlist is built from; its scores are copied into the version, so later runs do not change it." error={problems.scoringRunId}>
        {(control) => (
          <Select {...control} value={runId} onChange={(e) => setChosenRunId(e.target.value)}>
            {finished.map((r) => (
              <option key={r.id} value={r.id}>
                {r.name} · {r.surfaceName} · {dateTimeText(r.finishedAt ?? r.createdAt)}
              </option>
            ))}
          </Select>
        )}
      </Field>

      <section aria-label="Ranking" className="flex flex-col gap-2">
        <h4 className="text-sm font-semibold text-ink">1 · Choose sites from the ranking</h4>
        {run.isPending ? <Spinner label="Loading the ranking" className="flex justify-center p-4" /> : null}
        {run.isError ? <Alert tone="danger">{errorMessage(run.error)}</Alert> : null}
        {run.data ? <RunRankingPicker run={run.data} chosenIds={chosenIds} onToggle={(c) => setItems((list) => draftItemToggle(list, c))} /> : null}
      </section>

      <section aria-label="Chosen sites" className="flex flex-col gap-2">
        <h4 className="text-sm font-semibold text-ink">2 · Put them in order and add notes</h4>
        <p className="text-xs text-ink-muted">Executives read the shortlist in this order; a note says why a site is here or what to check next.</p>
        {problems.items ? <Alert tone="danger">{problems.items}</Alert> : null}
        <DraftItemsEditor items={items} onChange={setItems} runSiteIds={runSiteIds} />
      </section>

      <section aria-label="Save" className="flex flex-col gap-3">
        <h4 className="text-sm font-semibold text-ink">3 · {mode === 'create' ? 'Name and save' : 'Describe the change and save'}</h4>
        {mode === 'create' ? (
          <TextField
            label="Shortlist name"
            hint="What the executives will see in their list, e.g. “Harbour candidates for the March board”."
            value={name}
            maxLength={120}
            onChange={(e) => setName(e.target.value)}
            error={problems.name ?? (serverField === 'name' ? errorMessage(saveError) : undefined)}
          />
        ) : null}
        <TextField
          label="Version note (optional)"
          hint="What changed and why, kept with this version."
          value={versionNote}
          maxLength={500}
          onChange={(e) => setVersionNote(e.target.value)}
          error={problems.versionNote}
        />
        {serverProblem ? <Alert tone="danger" title="Not saved">{serverProblem}</Alert> : null}
        <div className="flex justify-end gap-2">
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
          <Button type="submit" isLoading={isSaving}>
            {mode === 'create' ? 'Save shortlist' : 'Save as new version'}
          </Button>
        </div>
      </section>
    </form>
  );
}

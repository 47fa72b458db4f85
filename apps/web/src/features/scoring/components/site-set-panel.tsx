import { Alert, Button, Input } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useCreateSiteSet } from '../api/create-site-set';
import type { ScoringRunJson } from '../types';
import { SiteSetCard } from './site-set-card';

/** The server scores sets of 2–20 candidates. */
export const SITE_SET_MAX = 20;

export type SiteSetPanelProps = {
  orgId: string;
  workspaceId: string;
  run: ScoringRunJson;
  canWrite: boolean;
  /** Candidates ticked in the ranking. */
  ticked: string[];
  onScored: () => void;
};

/**
 * Candidates opened together: "Score together" for the candidates ticked in the ranking (planners),
 * then every saved set of the run compared with its members scored alone.
 * @param props the workspace, the run, rights, the ticked candidates and what to do after scoring
 * @returns the panel
 * @example <SiteSetPanel orgId={o} workspaceId={w} run={run} canWrite ticked={ids} onScored={clear} />
 */
export function SiteSetPanel({ orgId, workspaceId, run, canWrite, ticked, onScored }: SiteSetPanelProps) {
  const [name, setName] = useState('');
  const create = useCreateSiteSet(orgId, workspaceId, run.id);
  const candidates = run.results?.candidates ?? [];
  const tooFew = ticked.length < 2;
  const tooMany = ticked.length > SITE_SET_MAX;

  const score = () =>
    create.mutate(
      { siteIds: ticked, ...(name.trim() ? { name: name.trim() } : {}) },
      {
        onSuccess: () => {
          setName('');
          onScored();
        },
      },
    );

  return (
    <section aria-label="Candidates opened together" className="flex flex-col gap-3">
      <h4 className="text-sm font-semibold text-ink">Candidates opened together</h4>
      <p className="text-xs text-ink-muted">
        Each candidate above is scored as if it alone opened. Opened together, candidates also compete with each other.
      </p>
      {canWrite ? (
        <div className="flex flex-wrap items-end gap-2">
          <Input
            aria-label="Set name (optional)"
            placeholder="Set name (optional)"
            className="w-60"
            value={name}
            maxLength={120}
            onChange={(e) => setName(e.target.value)}
          />
          <Button onClick={score} disabled={tooFew || tooMany} isLoading={create.isPending}>
            Score together{ticked.length ? ` (${ticked.length})` : ''}
          </Button>
          <span className="text-xs text-ink-muted">
            {tooMany ? `Tick at most ${SITE_SET_MAX} candidates.` : tooFew ? 'Tick two or more candidates in the ranking.' : null}
          </span>
        </div>
      ) : null}
      {create.error ? <Alert tone="danger">{errorMessage(create.error)}</Alert> : null}
      {run.sets.length ? (
        <div className="flex flex-col gap-3" aria-label="Saved candidate sets">
          {[...run.sets].reverse().map((set) => (
            <SiteSetCard key={set.id} set={set} candidates={candidates} weightLabel={run.weightLabel} />
          ))}
        </div>
      ) : (
        <p className="text-sm text-ink-muted">No sets scored for this run yet.</p>
      )}
    </section>
  );
}

import type { CustomerFile } from '../../../features/customer-files/types';
import type { ScoringRunSummaryJson } from '../../../features/scoring/types';
import type { ShortlistSummary } from '../../../features/shortlists/types';
import type { Site } from '../../../features/sites/types';
import type { Surface } from '../../../features/surfaces/types';
import type { StudyStepState } from '../../../features/workspaces/components/study-outline';

/**
 * Step 1's state in the study outline, from the customer files.
 * @param files the workspace's customer files (undefined while loading)
 * @returns the state, or undefined before any upload
 * @example customersState([importedFile]) // { label: 'Imported', tone: 'success', detail: '“loyalty.csv”: 488 customers.' }
 */
export function customersState(files: CustomerFile[] | undefined): StudyStepState | undefined {
  if (!files?.length) return undefined;
  const imported = files.filter((f) => f.status === 'imported');
  if (imported.length) {
    const n = imported[0]!.acceptedCount - imported[0]!.excludedCount;
    return { label: 'Imported', tone: 'success', detail: `“${imported[0]!.name}”: ${n.toLocaleString('en')} customers.` };
  }
  if (files.some((f) => f.status === 'importing')) return { label: 'Importing', tone: 'accent' };
  if (files.some((f) => f.status === 'awaiting-mapping')) return { label: 'Columns to check', tone: 'caution' };
  return { label: 'Import failed', tone: 'danger' };
}

/**
 * Step 2's state, from the surface runs.
 * @param surfaces the workspace's surfaces (undefined while loading)
 * @returns the state, or undefined before any run
 * @example surfaceState([runningSurface]) // { label: 'Running', tone: 'accent' }
 */
export function surfaceState(surfaces: Surface[] | undefined): StudyStepState | undefined {
  if (!surfaces?.length) return undefined;
  if (surfaces.some((s) => s.status === 'running' || s.status === 'queued')) return { label: 'Running', tone: 'accent' };
  const done = surfaces.filter((s) => s.status === 'succeeded').length;
  if (done) return { label: 'Ready', tone: 'success', detail: `${done} demand ${done === 1 ? 'surface' : 'surfaces'} ready to show on the map.` };
  return { label: 'No result yet', tone: 'caution' };
}

/**
 * Step 3's state, from the sites and the scoring runs: "Scored" once a run has succeeded, "Scoring" while
 * one runs, else the number of sites (a caution while there is no candidate to score).
 * @param sites the workspace's sites (undefined while loading or for executives, who read runs only)
 * @param runs the workspace's scoring runs (undefined while loading)
 * @returns the state, or undefined without sites or runs
 * @example sitesState(sites, [succeededRun]) // { label: 'Scored', tone: 'success', detail: '17 sites: 8 candidates, 6 own stores, 3 competitors. 1 scoring run finished.' }
 */
export function sitesState(sites: Site[] | undefined, runs?: ScoringRunSummaryJson[]): StudyStepState | undefined {
  const done = (runs ?? []).filter((r) => r.status === 'succeeded').length;
  const running = (runs ?? []).some((r) => r.status === 'queued' || r.status === 'running');
  const runText = done ? `${done} scoring ${done === 1 ? 'run' : 'runs'} finished.` : '';
  if (!sites?.length) {
    if (running) return { label: 'Scoring', tone: 'accent' };
    return done ? { label: 'Scored', tone: 'success', detail: runText } : undefined;
  }
  const count = (kind: Site['kind']) => sites.filter((s) => s.kind === kind).length;
  const [c, o, k] = [count('candidate'), count('own'), count('competitor')];
  const n = sites.length;
  const kinds = `${c} ${c === 1 ? 'candidate' : 'candidates'}, ${o} own ${o === 1 ? 'store' : 'stores'}, ${k} ${k === 1 ? 'competitor' : 'competitors'}.`;
  const detail = `${n} ${n === 1 ? 'site' : 'sites'}: ${kinds}${runText ? ` ${runText}` : ''}`;
  if (running) return { label: 'Scoring', tone: 'accent', detail };
  if (done) return { label: 'Scored', tone: 'success', detail };
  if (c === 0) return { label: 'No candidates yet', tone: 'caution', detail };
  return { label: `${n} ${n === 1 ? 'site' : 'sites'}`, tone: 'accent', detail };
}

/**
 * Step 4's state, from the workspace's shortlists: "Shared" once one was shared, else how many there are.
 * @param shortlists the workspace's shortlists (undefined while loading)
 * @returns the state, or undefined without shortlists
 * @example shortlistState([shared, draft]) // { label: 'Shared', tone: 'success', detail: '2 shortlists, 1 shared.' }
 */
export function shortlistState(shortlists: ShortlistSummary[] | undefined): StudyStepState | undefined {
  if (!shortlists?.length) return undefined;
  const n = shortlists.length;
  const shared = shortlists.filter((s) => s.sharedAt !== null).length;
  const count = `${n} ${n === 1 ? 'shortlist' : 'shortlists'}`;
  if (shared) return { label: 'Shared', tone: 'success', detail: `${count}, ${shared} shared.` };
  return { label: count, tone: 'accent', detail: `${count}, not shared yet.` };
}

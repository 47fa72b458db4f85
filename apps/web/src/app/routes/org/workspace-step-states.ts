import type { CustomerFile } from '../../../features/customer-files/types';
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
 * Step 3's state, from the sites: counts per kind; ready to score once there is a candidate.
 * @param sites the workspace's sites (undefined while loading or for executives)
 * @returns the state, or undefined without sites
 * @example sitesState(sites) // { label: 'Sites placed', tone: 'success', detail: '8 candidates, 6 own stores, 3 competitors.' }
 */
export function sitesState(sites: Site[] | undefined): StudyStepState | undefined {
  if (!sites?.length) return undefined;
  const count = (kind: Site['kind']) => sites.filter((s) => s.kind === kind).length;
  const [c, o, k] = [count('candidate'), count('own'), count('competitor')];
  const detail = `${c} ${c === 1 ? 'candidate' : 'candidates'}, ${o} own ${o === 1 ? 'store' : 'stores'}, ${k} ${k === 1 ? 'competitor' : 'competitors'}.`;
  if (c === 0) return { label: 'No candidates yet', tone: 'caution', detail };
  return { label: 'Sites placed', tone: 'success', detail };
}

import { Button, Card, CardHeader, Dialog, Spinner } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { getCustomerFilesQueryOptions, useCustomerFiles } from '../../../features/customer-files/api/get-customer-files';
import { CustomerFilesStep } from '../../../features/customer-files/components/customer-files-step';
import type { CustomerFile } from '../../../features/customer-files/types';
import { SurfaceMap } from '../../../features/map/components/surface-map';
import { getSurfacesQueryOptions, useSurfaces } from '../../../features/surfaces/api/get-surfaces';
import { SurfaceInspector } from '../../../features/surfaces/components/surface-inspector';
import { SurfacesStep } from '../../../features/surfaces/components/surfaces-step';
import type { Surface } from '../../../features/surfaces/types';
import { getWorkspaceQueryOptions, useWorkspace } from '../../../features/workspaces/api/get-workspace';
import { DeleteWorkspaceConfirm } from '../../../features/workspaces/components/delete-workspace-confirm';
import { EditWorkspaceForm } from '../../../features/workspaces/components/edit-workspace-form';
import { InspectorEmptyState } from '../../../features/workspaces/components/inspector-empty-state';
import { MapEmptyState } from '../../../features/workspaces/components/map-empty-state';
import {
  StudyOutline,
  type StudyStepKey,
  type StudyStepState,
} from '../../../features/workspaces/components/study-outline';
import { roleCan } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

/**
 * Loads the workspace before the page shows; a missing one (or another organization's) becomes the 404 page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'workspaces/:workspaceId', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (!(await orgMembership(queryClient, params.orgId))) return null;
    const orgId = params.orgId ?? '';
    const workspaceId = params.workspaceId ?? '';
    await queryClient.ensureQueryData(getWorkspaceQueryOptions(orgId, workspaceId));
    // The steps' lists load alongside; the page shows their own spinners if they are slower.
    void queryClient.prefetchQuery(getCustomerFilesQueryOptions(orgId, workspaceId));
    void queryClient.prefetchQuery(getSurfacesQueryOptions(orgId, workspaceId));
    return null;
  };

const openSteps = ['customers', 'surface'] as const satisfies readonly StudyStepKey[];

function customersState(files: CustomerFile[] | undefined): StudyStepState | undefined {
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

function surfaceState(surfaces: Surface[] | undefined): StudyStepState | undefined {
  if (!surfaces?.length) return undefined;
  if (surfaces.some((s) => s.status === 'running' || s.status === 'queued')) return { label: 'Running', tone: 'accent' };
  const done = surfaces.filter((s) => s.status === 'succeeded').length;
  if (done) return { label: 'Ready', tone: 'success', detail: `${done} demand ${done === 1 ? 'surface' : 'surfaces'} ready to show on the map.` };
  return { label: 'No result yet', tone: 'caution' };
}

/** One study: its four steps on the left, the map in the middle, the inspector on the right, the open step below. */
export default function WorkspaceRoute() {
  const { orgId, role } = useOrgContext();
  const { workspaceId = '' } = useParams();
  const navigate = useNavigate();
  const workspace = useWorkspace(orgId, workspaceId);
  const [dialog, setDialog] = useState<'edit' | 'delete' | null>(null);
  const files = useCustomerFiles(orgId, workspaceId);
  const surfaces = useSurfaces(orgId, workspaceId);
  const [chosenStep, setChosenStep] = useState<(typeof openSteps)[number] | null>(null);
  const [chosenSurfaceId, setChosenSurfaceId] = useState<string | null>(null);
  const hasImported = files.data?.some((f) => f.status === 'imported');

  // On arrival, open the next step to do (customers first, then the surface); after that the step
  // only changes when the user picks one, so a finished import does not swap the report away.
  useEffect(() => {
    if (chosenStep === null && hasImported !== undefined) setChosenStep(hasImported ? 'surface' : 'customers');
  }, [chosenStep, hasImported]);

  if (!workspace.data) return <Spinner label="Loading the workspace" className="flex justify-center p-16" />;
  const ws = workspace.data;

  const imported = (files.data ?? []).filter((f) => f.status === 'imported');
  const step = chosenStep ?? 'customers';
  const finished = [...(surfaces.data ?? [])].filter((s) => s.status === 'succeeded').sort((a, b) => b.queuedAt.localeCompare(a.queuedAt));
  const shown = finished.find((s) => s.id === chosenSurfaceId) ?? finished[0] ?? null;
  const shownFile = shown ? (files.data ?? []).find((f) => f.id === shown.customerFileId) : undefined;
  const sources = imported.map((f) => ({ id: f.id, name: f.name, acceptedCount: f.acceptedCount - f.excludedCount, weightLabel: f.weightLabel }));

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <Link to={paths.org.workspaces.getHref(orgId)} className="text-sm text-ink-muted hover:text-accent">
            ← Workspaces
          </Link>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight text-ink">{ws.name}</h1>
          {ws.description ? <p className="mt-1 max-w-3xl text-sm whitespace-pre-line text-ink-muted">{ws.description}</p> : null}
          <p className="mt-1 text-xs text-ink-faint">
            Created {dateText(ws.createdAt)}
            {ws.createdBy ? ` by ${ws.createdBy.name}` : ''} · updated {dateText(ws.updatedAt)}
          </p>
        </div>
        <div className="flex gap-2">
          {roleCan(role, 'workspace:update') ? (
            <Button variant="secondary" onClick={() => setDialog('edit')}>
              Edit details
            </Button>
          ) : null}
          {roleCan(role, 'workspace:delete') ? (
            <Button variant="ghost" className="text-danger hover:text-danger" onClick={() => setDialog('delete')}>
              Delete
            </Button>
          ) : null}
        </div>
      </div>

      <div className="grid gap-4 lg:grid-cols-[17rem_minmax(0,1fr)_16rem]">
        <Card className="p-2">
          <h2 className="px-3 pt-2 text-xs font-semibold tracking-wide text-ink-faint uppercase">Study outline</h2>
          <StudyOutline
            states={{ customers: customersState(files.data), surface: surfaceState(surfaces.data) }}
            activeKey={step}
            selectable={openSteps}
            onSelect={(key) => setChosenStep(key as (typeof openSteps)[number])}
          />
        </Card>
        <section aria-label="Map">
          {shown ? (
            <SurfaceMap
              scope={{ orgId, workspaceId }}
              surface={shown}
              customerFile={shownFile ? { id: shownFile.id, name: shownFile.name, weightKind: shownFile.weightKind ?? 'count', weightLabel: shownFile.weightLabel } : null}
              role={role}
              compareCandidates={finished}
            />
          ) : (
            <MapEmptyState />
          )}
        </section>
        <Card>{shown ? <SurfaceInspector surface={shown} /> : <InspectorEmptyState />}</Card>
      </div>

      <Card>
        {step === 'customers' ? (
          <>
            <CardHeader
              title="1 · Customers"
              description="Upload a customer file, check its columns, and read which rows were accepted and why others were not."
            />
            <div className="p-5">
              <CustomerFilesStep orgId={orgId} workspaceId={workspaceId} canWrite={roleCan(role, 'customerFile:write')} />
            </div>
          </>
        ) : (
          <>
            <CardHeader
              title="2 · Demand surface"
              description="Spread the customers into demand per area; the bandwidth, grid and cost are shown before anything runs."
            />
            <div className="p-5">
              <SurfacesStep
                orgId={orgId}
                workspaceId={workspaceId}
                sources={sources}
                canWrite={roleCan(role, 'surface:write')}
                selectedId={shown?.id ?? null}
                onSelect={(s) => setChosenSurfaceId(s.id)}
              />
            </div>
          </>
        )}
      </Card>

      <Dialog open={dialog === 'edit'} onClose={() => setDialog(null)} title="Edit workspace">
        <EditWorkspaceForm orgId={orgId} workspace={ws} onDone={() => setDialog(null)} />
      </Dialog>
      <Dialog open={dialog === 'delete'} onClose={() => setDialog(null)} title="Delete this workspace?">
        <DeleteWorkspaceConfirm
          orgId={orgId}
          workspace={ws}
          onCancel={() => setDialog(null)}
          onDeleted={() => navigate(paths.org.workspaces.getHref(orgId), { replace: true })}
        />
      </Dialog>
    </div>
  );
}

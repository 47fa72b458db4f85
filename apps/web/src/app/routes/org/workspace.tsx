import { Button, Card, CardHeader, Dialog, Spinner } from '@demandscape/ui';
import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { getCustomerFilesQueryOptions, useCustomerFiles } from '../../../features/customer-files/api/get-customer-files';
import { CustomerFilesStep } from '../../../features/customer-files/components/customer-files-step';
import { BasemapSiteMap } from '../../../features/map/components/basemap-site-map';
import { SiteSymbol } from '../../../features/map/components/site-legend';
import { SurfaceMap, type SurfaceMapSiteProps } from '../../../features/map/components/surface-map';
import type { MapSite } from '../../../features/map/types';
import { useScoringRuns } from '../../../features/scoring/api/get-scoring-runs';
import { ScoringStep } from '../../../features/scoring/components/scoring-step';
import { useShortlists } from '../../../features/shortlists/api/get-shortlists';
import { ShortlistStep } from '../../../features/shortlists/components/shortlist-step';
import { getSitesQueryOptions, useSites } from '../../../features/sites/api/get-sites';
import { useUpdateSite } from '../../../features/sites/api/update-site';
import { SiteInspector } from '../../../features/sites/components/site-inspector';
import { SitesStep } from '../../../features/sites/components/sites-step';
import type { SitePick } from '../../../features/sites/types';
import { getSurfacesQueryOptions, useSurfaces } from '../../../features/surfaces/api/get-surfaces';
import { SurfaceInspector } from '../../../features/surfaces/components/surface-inspector';
import { SurfacesStep } from '../../../features/surfaces/components/surfaces-step';
import { getWorkspaceQueryOptions, useWorkspace } from '../../../features/workspaces/api/get-workspace';
import { DeleteWorkspaceConfirm } from '../../../features/workspaces/components/delete-workspace-confirm';
import { EditWorkspaceForm } from '../../../features/workspaces/components/edit-workspace-form';
import { InspectorEmptyState } from '../../../features/workspaces/components/inspector-empty-state';
import { MapEmptyState } from '../../../features/workspaces/components/map-empty-state';
import { StudyOutline, type StudyStepKey } from '../../../features/workspaces/components/study-outline';
import { roleCan } from '../../../lib/authorization';
import { dateText } from '../../../lib/format';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';
import { customersState, shortlistState, sitesState, surfaceState } from './workspace-step-states';

/**
 * Loads the workspace before the page shows; a missing one (or another organization's) becomes the 404 page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'workspaces/:workspaceId', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const membership = await orgMembership(queryClient, params.orgId);
    if (!membership) return null;
    const orgId = params.orgId ?? '';
    const workspaceId = params.workspaceId ?? '';
    await queryClient.ensureQueryData(getWorkspaceQueryOptions(orgId, workspaceId));
    // The steps' lists load alongside; the page shows their own spinners if they are slower.
    void queryClient.prefetchQuery(getCustomerFilesQueryOptions(orgId, workspaceId));
    void queryClient.prefetchQuery(getSurfacesQueryOptions(orgId, workspaceId));
    if (roleCan(membership.role, 'site:read')) void queryClient.prefetchQuery(getSitesQueryOptions(orgId, workspaceId));
    return null;
  };

/** Every step opens its panel below the map. */
const openSteps = ['customers', 'surface', 'sites', 'shortlist'] as const satisfies readonly StudyStepKey[];
type OpenStep = (typeof openSteps)[number];

function stepFrom(value: string | null): OpenStep | null {
  return openSteps.find((s) => s === value) ?? null;
}

/**
 * One study: its four steps on the left, the map in the middle, the inspector on the right, the open step below.
 * `?step=customers|surface|sites|shortlist` opens that step (links from other pages); choosing a step keeps the address in step.
 */
export default function WorkspaceRoute() {
  const { orgId, role } = useOrgContext();
  const { workspaceId = '' } = useParams();
  const navigate = useNavigate();
  const workspace = useWorkspace(orgId, workspaceId);
  const [dialog, setDialog] = useState<'edit' | 'delete' | null>(null);
  const files = useCustomerFiles(orgId, workspaceId);
  const surfaces = useSurfaces(orgId, workspaceId);
  const canReadSites = roleCan(role, 'site:read');
  const canWriteSites = roleCan(role, 'site:write');
  const sites = useSites(orgId, workspaceId, canReadSites);
  const moveSite = useUpdateSite(orgId, workspaceId);
  const [search, setSearch] = useSearchParams();
  const [chosenStep, setChosenStep] = useState<OpenStep | null>(() => stepFrom(search.get('step')));
  const runs = useScoringRuns(orgId, workspaceId);
  const shortlists = useShortlists(orgId, workspaceId);
  const [chosenSurfaceId, setChosenSurfaceId] = useState<string | null>(null);
  const [selectedSiteId, setSelectedSiteId] = useState<string | null>(null);
  // "Add on map": while on (sites step, writers), a click on the map is a position for the site form.
  const [pickOnMap, setPickOnMap] = useState(false);
  const [picked, setPicked] = useState<SitePick | null>(null);
  // Text drawn beside sites on the map instead of their names, by site id (e.g. "#1" for a rank).
  // The scoring panel sets it through `setSiteLabels` (its `onSiteLabels` prop) and clears it with {}.
  const [siteLabels, setSiteLabels] = useState<Record<string, string>>({});
  const hasImported = files.data?.some((f) => f.status === 'imported');
  // One array per change of the sites or labels, so the map redraws its sites only then.
  const mapSites = useMemo<MapSite[]>(
    () => (sites.data ?? []).map((s) => ({ id: s.id, name: s.name, kind: s.kind, lon: s.lon, lat: s.lat, label: siteLabels[s.id] })),
    [sites.data, siteLabels],
  );

  // On arrival, open the next step to do (planners: the sites; others: customers first, then the
  // surface); after that the step only changes when the user picks one, so a finished import does
  // not swap the report away.
  useEffect(() => {
    if (chosenStep !== null) return;
    if (role === 'planner') setChosenStep('sites');
    else if (hasImported !== undefined) setChosenStep(hasImported ? 'surface' : 'customers');
  }, [chosenStep, hasImported, role]);

  if (!workspace.data) return <Spinner label="Loading the workspace" className="flex justify-center p-16" />;
  const ws = workspace.data;

  const imported = (files.data ?? []).filter((f) => f.status === 'imported');
  const step = chosenStep ?? 'customers';
  const finished = [...(surfaces.data ?? [])].filter((s) => s.status === 'succeeded').sort((a, b) => b.queuedAt.localeCompare(a.queuedAt));
  const shown = finished.find((s) => s.id === chosenSurfaceId) ?? finished[0] ?? null;
  const shownFile = shown ? (files.data ?? []).find((f) => f.id === shown.customerFileId) : undefined;
  const sources = imported.map((f) => ({ id: f.id, name: f.name, acceptedCount: f.acceptedCount - f.excludedCount, weightLabel: f.weightLabel }));
  const siteList = sites.data ?? [];
  const selectedSite = siteList.find((s) => s.id === selectedSiteId) ?? null;
  const editingSites = step === 'sites' && canWriteSites;
  const siteProps: SurfaceMapSiteProps = {
    sites: canReadSites ? mapSites : undefined,
    selectedSiteId,
    onSiteSelect: setSelectedSiteId,
    onMapClickAdd: editingSites && pickOnMap ? (p) => setPicked((last) => ({ ...p, seq: (last?.seq ?? 0) + 1 })) : undefined,
    // Rounded to 1e-7° (about 1 cm): no false precision from the pointer.
    onSiteMove: editingSites ? (id, p) => moveSite.mutate({ siteId: id, changes: { lon: Number(p.lon.toFixed(7)), lat: Number(p.lat.toFixed(7)) } }) : undefined,
  };
  // Without a surface the basemap still shows the sites, and gives writers somewhere to click.
  const basemapOnly = !shown && (mapSites.length > 0 || editingSites);

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
            states={{
              customers: customersState(files.data),
              surface: surfaceState(surfaces.data),
              sites: sitesState(sites.data, runs.data),
              shortlist: shortlistState(shortlists.data),
            }}
            activeKey={step}
            selectable={openSteps}
            onSelect={(key) => {
              setChosenStep(key as OpenStep);
              setSearch({ step: key }, { replace: true });
            }}
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
              {...siteProps}
            />
          ) : basemapOnly ? (
            <BasemapSiteMap note="No demand surface yet: the sites are shown on the basemap alone." {...siteProps} />
          ) : (
            <MapEmptyState />
          )}
        </section>
        <Card>
          {selectedSite ? (
            <SiteInspector site={selectedSite} symbol={<SiteSymbol kind={selectedSite.kind} size={14} />} onClose={() => setSelectedSiteId(null)} />
          ) : shown ? (
            <SurfaceInspector surface={shown} />
          ) : (
            <InspectorEmptyState />
          )}
        </Card>
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
        ) : null}
        {step === 'surface' ? (
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
        ) : null}
        {step === 'sites' ? (
          <>
            <CardHeader
              title="3 · Sites & scoring"
              description="Place candidate sites, own stores and competitors, then score each candidate’s trade area against a demand surface."
            />
            <div className="flex flex-col gap-8 p-5">
              <SitesStep
                orgId={orgId}
                workspaceId={workspaceId}
                canRead={canReadSites}
                canWrite={canWriteSites}
                selectedId={selectedSiteId}
                onSelect={setSelectedSiteId}
                pickOnMap={pickOnMap}
                onPickOnMapChange={setPickOnMap}
                picked={picked}
                symbol={(kind) => <SiteSymbol kind={kind} size={14} />}
              />
              <ScoringStep
                orgId={orgId}
                workspaceId={workspaceId}
                surfaces={finished.map((f) => ({ id: f.id, name: f.name }))}
                canWrite={roleCan(role, 'scoring:write')}
                onSiteLabels={setSiteLabels}
              />
            </div>
          </>
        ) : null}
        {step === 'shortlist' ? (
          <>
            <CardHeader
              title="4 · Shortlist"
              description="Rank the candidates, keep the best with notes, and share the shortlist with the people who approve the lease."
              actions={
                <Link to={paths.org.shortlists.getHref(orgId)} className="text-sm font-medium text-accent hover:underline">
                  All shortlists of the organization
                </Link>
              }
            />
            <div className="p-5">
              <ShortlistStep orgId={orgId} workspaceId={workspaceId} canWrite={roleCan(role, 'shortlist:write')} />
            </div>
          </>
        ) : null}
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

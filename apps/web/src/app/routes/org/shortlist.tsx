import { Alert, Card, CardHeader, Spinner } from '@demandscape/ui';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { data, Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../../config/paths';
import { getCustomerFileQueryOptions } from '../../../features/customer-files/api/get-customer-file';
import { BasemapSiteMap } from '../../../features/map/components/basemap-site-map';
import { SurfaceMap } from '../../../features/map/components/surface-map';
import { getOrgShortlistsQueryOptions, useOrgShortlists } from '../../../features/shortlists/api/get-org-shortlists';
import { getShortlistQueryOptions, useShortlist } from '../../../features/shortlists/api/get-shortlist';
import { ShortlistCaution } from '../../../features/shortlists/components/shortlist-caution';
import { ShortlistDownloads } from '../../../features/shortlists/components/shortlist-downloads';
import { ShortlistRankedTable } from '../../../features/shortlists/components/shortlist-ranked-table';
import { ShortlistSiteNotes } from '../../../features/shortlists/components/shortlist-site-notes';
import { ShortlistVersionLine } from '../../../features/shortlists/components/shortlist-version-line';
import { VersionPicker } from '../../../features/shortlists/components/version-picker';
import { shortlistMapSites } from '../../../features/shortlists/utils/shortlist-map-sites';
import { getSurfaceQueryOptions } from '../../../features/surfaces/api/get-surface';
import { errorMessage } from '../../../lib/api-error';
import { roleCan } from '../../../lib/authorization';
import { useOrgContext } from './org-context';
import { orgMembership } from './org-membership';

function versionFrom(value: string | null): number | null {
  const n = Number(value);
  return value && Number.isInteger(n) && n > 0 ? n : null;
}

/**
 * Finds the shortlist's workspace in the organization's list, then loads the version asked for; an unknown
 * shortlist (or another organization's) becomes the 404 page.
 * @param queryClient the app's query client
 * @returns the loader
 * @example { path: 'shortlists/:shortlistId', loader: clientLoader(queryClient) }
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    if (!(await orgMembership(queryClient, params.orgId))) return null;
    const orgId = params.orgId ?? '';
    const list = await queryClient.ensureQueryData(getOrgShortlistsQueryOptions(orgId));
    const summary = list.find((s) => s.id === params.shortlistId);
    if (!summary) throw data('Shortlist not found', { status: 404 });
    const version = versionFrom(new URL(request.url).searchParams.get('version'));
    void queryClient.prefetchQuery(getShortlistQueryOptions(orgId, summary.workspaceId, summary.id, version));
    return null;
  };

/**
 * The read-only shortlist page every role may open (the link in the share e-mail): ranked sites with their
 * key numbers, the map with the surface and the sites, each site's note and explanation, the caution and
 * the downloads. Executives see the surface and aggregates only, never customers.
 */
export default function ShortlistRoute() {
  const { orgId, role } = useOrgContext();
  const { shortlistId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const version = versionFrom(search.get('version'));
  const list = useOrgShortlists(orgId);
  const summary = list.data?.find((s) => s.id === shortlistId);
  const workspaceId = summary?.workspaceId ?? '';
  const shortlist = useShortlist(orgId, workspaceId, shortlistId, version);
  const v = shortlist.data?.version;
  const surface = useQuery({ ...getSurfaceQueryOptions(orgId, workspaceId, v?.surfaceId ?? ''), enabled: Boolean(v) });
  // Legend words come from the customer file's metadata; executives get no customer file at all.
  const showFile = role !== 'executive' && Boolean(surface.data?.customerFileId);
  const file = useQuery({ ...getCustomerFileQueryOptions(orgId, workspaceId, surface.data?.customerFileId ?? ''), enabled: showFile });
  // Without the file (executives) the legend reads the run's weight label saved with the version; the runs
  // call an unweighted file's demand "customers".
  const weightLabel = v?.weightLabel.trim() ?? '';
  const weight = weightLabel && weightLabel !== 'customers' ? { kind: 'other' as const, label: weightLabel } : { kind: 'count' as const, label: null };
  // Chosen candidates labelled with their order, plus the own stores and competitors they were scored against.
  const sites = useMemo(() => (v ? shortlistMapSites(v) : []), [v]);

  if (list.isError || shortlist.isError) {
    return (
      <Alert tone="danger" title="Could not load the shortlist">
        {errorMessage(list.error ?? shortlist.error)}
      </Alert>
    );
  }
  if (!shortlist.data || !v) return <Spinner label="Loading the shortlist" className="flex justify-center p-16" />;
  const s = shortlist.data;

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <Link to={paths.org.shortlists.getHref(orgId)} className="text-sm text-ink-muted hover:text-accent">
            ← Shortlists
          </Link>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight text-ink">{s.name}</h1>
          <p className="text-sm text-ink-muted">
            Workspace <span className="font-medium text-ink">{s.workspaceName}</span> · {v.items.length} {v.items.length === 1 ? 'site' : 'sites'} of{' '}
            {v.candidateCount} candidates scored
          </p>
          <div className="mt-2">
            <ShortlistVersionLine shortlist={s} />
          </div>
        </div>
        {roleCan(role, 'shortlist:write') ? (
          <Link className="text-sm font-medium text-accent hover:underline" to={paths.org.workspace.getHref(orgId, s.workspaceId, 'shortlist')}>
            Edit in workspace
          </Link>
        ) : null}
      </div>

      <VersionPicker
        versions={s.versions}
        value={v.version}
        onChange={(n) => setSearch(n === s.latestVersion ? {} : { version: String(n) }, { replace: true })}
      />

      <ShortlistCaution caution={s.caution} />

      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_18rem]">
        <section aria-label="Map">
          {surface.data ? (
            <SurfaceMap
              scope={{ orgId, workspaceId: s.workspaceId }}
              surface={surface.data}
              customerFile={
                showFile && file.data
                  ? { id: file.data.id, name: file.data.name, weightKind: file.data.weightKind ?? 'count', weightLabel: file.data.weightLabel }
                  : null
              }
              weight={weight}
              role={role}
              sites={sites}
            />
          ) : surface.isError ? (
            <div className="flex flex-col gap-3">
              <Alert tone="caution" title={`The demand surface “${v.surfaceName}” cannot be shown`}>
                {errorMessage(surface.error)} The numbers below were saved with this version and stay valid for it.
              </Alert>
              <BasemapSiteMap sites={sites} note="The sites of this version on the basemap, without the demand surface." />
            </div>
          ) : (
            <Spinner label="Loading the map" className="flex h-80 items-center justify-center" />
          )}
        </section>
        <Card>
          <CardHeader title="Downloads" description="The report of this version and the full ranking it comes from." />
          <div className="p-5">
            <ShortlistDownloads orgId={orgId} workspaceId={s.workspaceId} shortlistId={s.id} version={v.version} scoringRunId={v.scoringRunId} />
          </div>
        </Card>
      </div>

      <section aria-label="Ranked sites" className="flex flex-col gap-3">
        <h2 className="text-base font-semibold text-ink">Ranked sites</h2>
        <ShortlistRankedTable version={v} />
      </section>

      <section aria-label="Why each site" className="flex flex-col gap-3">
        <h2 className="text-base font-semibold text-ink">Why each site</h2>
        <ShortlistSiteNotes version={v} />
      </section>
    </div>
  );
}

import { Alert, Button, Dialog, EmptyState, Spinner } from '@demandscape/ui';
import { useEffect, useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-error';
import { useSites } from '../api/get-sites';
import type { Site, SiteKind, SitePick } from '../types';
import { DeleteSiteConfirm } from './delete-site-confirm';
import { SiteForm } from './site-form';
import { SiteImport } from './site-import';
import { SiteList } from './site-list';

export type SitesStepProps = {
  orgId: string;
  workspaceId: string;
  /** Owners, analysts and planners see the sites; executives get a pointer to the shortlists instead. */
  canRead: boolean;
  /** Owners and planners: add, import, edit, move, delete. */
  canWrite: boolean;
  selectedId: string | null;
  onSelect: (id: string | null) => void;
  /** Whether a click on the map picks a position for the form ("Add on map"). */
  pickOnMap: boolean;
  onPickOnMapChange: (on: boolean) => void;
  /** The last position picked on the map. */
  picked: SitePick | null;
  /** Draws a kind's map symbol beside the list headings (the route passes the map's). */
  symbol?: (kind: SiteKind) => ReactNode;
};

type Editor = { mode: 'new' } | { mode: 'edit'; site: Site } | null;

/**
 * Study step 3, sites: candidate sites, own stores and competitors grouped by kind; add (form, map click
 * or file import), edit, move and delete for owners and planners; a read-only list for analysts.
 * @param props the workspace, rights, selection and the map-pick state the route shares with the map
 * @returns the step's panel
 * @example <SitesStep orgId={o} workspaceId={w} canRead canWrite selectedId={id} onSelect={select} pickOnMap={on} onPickOnMapChange={setOn} picked={pick} />
 */
export function SitesStep(props: SitesStepProps) {
  const { orgId, workspaceId, canRead, canWrite, selectedId, onSelect, pickOnMap, onPickOnMapChange, picked, symbol } = props;
  const sites = useSites(orgId, workspaceId, canRead);
  const [editor, setEditor] = useState<Editor>(null);
  const [deleting, setDeleting] = useState<Site | null>(null);
  const [importing, setImporting] = useState(false);
  const [imported, setImported] = useState<number | null>(null);
  const [seenSeq, setSeenSeq] = useState(picked?.seq ?? null);

  // A map click with no form open starts a new site there; with a form open, the form takes the position.
  useEffect(() => {
    if (!picked || picked.seq === seenSeq) return;
    setSeenSeq(picked.seq);
    if (canWrite && editor === null) setEditor({ mode: 'new' });
  }, [picked, seenSeq, canWrite, editor]);

  if (!canRead) {
    return (
      <p className="text-sm text-ink-muted">
        Planners add and score the sites of a study; the ranked candidates reach you as shortlists.{' '}
        <Link to={paths.org.shortlists.getHref(orgId)} className="font-medium text-accent hover:underline">
          Open the shortlists
        </Link>
        .
      </p>
    );
  }
  if (sites.isPending) return <Spinner label="Loading the sites" className="flex justify-center p-6" />;
  if (sites.error) return <Alert tone="danger" title="The sites did not load">{errorMessage(sites.error)}</Alert>;
  const list = sites.data;
  const labels = list.map((s) => s.attractivenessLabel.trim()).filter(Boolean);
  const commonLabel = labels.sort((a, b) => labels.filter((l) => l === b).length - labels.filter((l) => l === a).length)[0] ?? '';
  const units = new Set(labels);
  // The site being edited as the list has it now, so a drag on the map while the form is open reaches the form.
  const editedSite = editor?.mode === 'edit' ? (list.find((s) => s.id === editor.site.id) ?? editor.site) : undefined;

  return (
    <div className="flex flex-col gap-5">
      {canWrite ? (
        <div className="flex flex-wrap items-center gap-2">
          <Button onClick={() => setEditor({ mode: 'new' })} disabled={editor !== null}>
            New site
          </Button>
          <Button variant={pickOnMap ? 'primary' : 'secondary'} aria-pressed={pickOnMap} onClick={() => onPickOnMapChange(!pickOnMap)}>
            {pickOnMap ? 'Add on map: on' : 'Add on map'}
          </Button>
          <Button variant="secondary" onClick={() => setImporting(true)}>
            Import sites
          </Button>
          <p className="text-xs text-ink-muted">
            {pickOnMap ? 'Click the map: the form opens with the position filled.' : 'Drag a site on the map to move it; “Add on map” places new ones by clicking.'}
          </p>
        </div>
      ) : (
        <p className="text-xs text-ink-muted">Planners and owners add and change sites; you can view them and select one to see its details.</p>
      )}
      {imported !== null ? (
        <Alert tone="success">
          Imported {imported.toLocaleString('en')} {imported === 1 ? 'site' : 'sites'}.
        </Alert>
      ) : null}
      {units.size > 1 ? (
        <Alert tone="caution" title="The sites use different attractiveness units">
          {[...units].map((u) => `“${u}”`).join(', ')}: scoring compares the numbers directly, so give every site of the study the same measure.
        </Alert>
      ) : null}
      {editor ? (
        <section aria-label={editor.mode === 'new' ? 'Add a site' : `Edit ${editor.site.name}`} className="rounded-panel border border-line p-4">
          <h3 className="mb-3 text-base font-semibold text-ink">{editor.mode === 'new' ? 'New site' : `Edit “${editor.site.name}”`}</h3>
          <SiteForm
            key={editor.mode === 'new' ? 'new' : editor.site.id}
            orgId={orgId}
            workspaceId={workspaceId}
            site={editedSite}
            picked={picked}
            defaultLabel={commonLabel}
            onDone={(site) => {
              setEditor(null);
              onSelect(site.id);
            }}
            onCancel={() => setEditor(null)}
          />
        </section>
      ) : null}
      {list.length === 0 ? (
        <EmptyState title="No sites yet">
          {canWrite
            ? 'Add candidate sites, your own stores and competitors: with the form, by clicking the map, or from a CSV or XLSX file.'
            : 'Planners and owners add the candidate sites, own stores and competitors of this study.'}
        </EmptyState>
      ) : (
        <SiteList
          sites={list}
          selectedId={selectedId}
          onSelect={(id) => onSelect(id === selectedId ? null : id)}
          canWrite={canWrite}
          onEdit={(site) => setEditor({ mode: 'edit', site })}
          onDelete={setDeleting}
          symbol={symbol}
        />
      )}
      <Dialog open={deleting !== null} onClose={() => setDeleting(null)} title="Delete this site?">
        {deleting ? (
          <DeleteSiteConfirm
            orgId={orgId}
            workspaceId={workspaceId}
            site={deleting}
            onCancel={() => setDeleting(null)}
            onDeleted={() => {
              if (deleting.id === selectedId) onSelect(null);
              setDeleting(null);
            }}
          />
        ) : null}
      </Dialog>
      <Dialog open={importing} onClose={() => setImporting(false)} title="Import sites" className="w-[min(56rem,calc(100vw-2rem))]">
        {importing ? (
          <SiteImport
            orgId={orgId}
            workspaceId={workspaceId}
            onImported={(count) => {
              setImported(count);
              setImporting(false);
            }}
            onCancel={() => setImporting(false)}
          />
        ) : null}
      </Dialog>
    </div>
  );
}

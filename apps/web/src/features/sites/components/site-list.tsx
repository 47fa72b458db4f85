import { Badge, Button } from '@demandscape/ui';
import type { ReactNode } from 'react';
import type { Site, SiteKind } from '../types';
import { attractivenessText, siteKindOrder, siteKindWords } from '../utils/site-explanations';

export type SiteListProps = {
  sites: Site[];
  selectedId: string | null;
  onSelect: (id: string) => void;
  /** Owners and planners: edit and delete buttons on each row. */
  canWrite: boolean;
  onEdit: (site: Site) => void;
  onDelete: (site: Site) => void;
  /** Draws the kind's map symbol (the route passes the map's, so list and map match). */
  symbol?: (kind: SiteKind) => ReactNode;
};

/**
 * The workspace's sites grouped by kind (candidates, own stores, competitors) with a count per group;
 * a row selects its site (the map rings it, the inspector shows it).
 * @param props sites, selection, rights and row actions
 * @returns the grouped list
 * @example <SiteList sites={sites} selectedId={id} onSelect={select} canWrite onEdit={edit} onDelete={confirm} />
 */
export function SiteList({ sites, selectedId, onSelect, canWrite, onEdit, onDelete, symbol }: SiteListProps) {
  return (
    <div className="grid gap-4 lg:grid-cols-3">
      {siteKindOrder.map((kind) => {
        const group = sites.filter((s) => s.kind === kind);
        const headingId = `site-group-${kind}`;
        return (
          <section key={kind} aria-labelledby={headingId} className="flex flex-col gap-2">
            <h4 id={headingId} className="flex items-center gap-2 text-sm font-semibold text-ink">
              {symbol?.(kind)}
              {siteKindWords[kind].many}
              <Badge className="tabular-nums">{group.length}</Badge>
            </h4>
            {group.length === 0 ? (
              <p className="text-xs text-ink-muted">None yet.</p>
            ) : (
              <ul className="flex flex-col divide-y divide-line rounded-control border border-line">
                {group.map((site) => {
                  const selected = site.id === selectedId;
                  return (
                    <li key={site.id} className={`flex items-center gap-2 px-2 py-1.5 ${selected ? 'bg-accent-soft' : ''}`}>
                      <button
                        type="button"
                        onClick={() => onSelect(site.id)}
                        aria-pressed={selected}
                        className="min-w-0 flex-1 rounded-control px-1 py-0.5 text-left hover:bg-sunken"
                      >
                        <span className="block truncate text-sm text-ink">{site.name}</span>
                        <span className="block text-xs text-ink-muted tabular-nums">{attractivenessText(site.attractiveness, site.attractivenessLabel)}</span>
                      </button>
                      {canWrite ? (
                        <>
                          <Button size="sm" variant="ghost" onClick={() => onEdit(site)} aria-label={`Edit ${site.name}`}>
                            Edit
                          </Button>
                          <Button size="sm" variant="ghost" className="text-danger hover:text-danger" onClick={() => onDelete(site)} aria-label={`Delete ${site.name}`}>
                            Delete
                          </Button>
                        </>
                      ) : null}
                    </li>
                  );
                })}
              </ul>
            )}
          </section>
        );
      })}
    </div>
  );
}

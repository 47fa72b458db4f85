import { Button } from '@demandscape/ui';
import type { ReactNode } from 'react';
import { dateText } from '../../../lib/format';
import type { Site } from '../types';
import { attractivenessText, siteKindWords } from '../utils/site-explanations';

export type SiteInspectorProps = {
  site: Site;
  /** The kind's map symbol, so the inspector matches the map. */
  symbol?: ReactNode;
  /** Extra lines from other steps, e.g. the site's rank and scores. */
  children?: ReactNode;
  onClose: () => void;
};

/**
 * The selected site's details beside the map: kind, position, attractiveness with its unit, notes, who
 * added it and when.
 * @param props the site, its symbol, extra content and how to close
 * @returns the inspector panel
 * @example <SiteInspector site={site} onClose={() => select(null)} />
 */
export function SiteInspector({ site, symbol, children, onClose }: SiteInspectorProps) {
  return (
    <section aria-label={`Site ${site.name}`} className="flex flex-col gap-3 p-4 text-sm">
      <div className="flex items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="flex items-center gap-1.5 text-xs text-ink-muted">
            {symbol}
            {siteKindWords[site.kind].one}
          </p>
          <h3 className="mt-0.5 font-semibold break-words text-ink">{site.name}</h3>
        </div>
        <Button size="sm" variant="ghost" onClick={onClose} aria-label="Close the site details">
          Close
        </Button>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1.5 text-xs">
        <dt className="text-ink-muted">Attractiveness</dt>
        <dd className="text-ink tabular-nums">{attractivenessText(site.attractiveness, site.attractivenessLabel)}</dd>
        <dt className="text-ink-muted">Longitude</dt>
        <dd className="text-ink tabular-nums">{site.lon.toFixed(5)}°</dd>
        <dt className="text-ink-muted">Latitude</dt>
        <dd className="text-ink tabular-nums">{site.lat.toFixed(5)}°</dd>
        <dt className="text-ink-muted">Added</dt>
        <dd className="text-ink">
          {dateText(site.createdAt)}
          {site.createdBy ? ` by ${site.createdBy.name}` : ''}
        </dd>
        {site.updatedAt !== site.createdAt ? (
          <>
            <dt className="text-ink-muted">Changed</dt>
            <dd className="text-ink">{dateText(site.updatedAt)}</dd>
          </>
        ) : null}
      </dl>
      {site.notes ? (
        <div>
          <h4 className="text-xs font-semibold text-ink">Notes</h4>
          <p className="mt-0.5 text-xs whitespace-pre-line text-ink-muted">{site.notes}</p>
        </div>
      ) : null}
      {children}
    </section>
  );
}

import type { MapSite, MapSiteKind } from '../types';
import { SITE_RING_WIDTH, SITE_SYMBOL_SIZE, siteKinds, siteSymbolPolygon, siteSymbolSpecs } from '../utils/site-symbols';

/**
 * A kind's map symbol as a small SVG (same shape and colour as on the map).
 * @param props the kind and the drawn size in pixels
 * @returns the SVG, hidden from assistive technology (the text beside it names the kind)
 * @example <SiteSymbol kind="candidate" />
 */
export function SiteSymbol({ kind, size = 18 }: { kind: MapSiteKind; size?: number }) {
  const spec = siteSymbolSpecs[kind];
  const points = siteSymbolPolygon(kind, SITE_SYMBOL_SIZE)
    .map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`)
    .join(' ');
  return (
    <svg width={size} height={size} viewBox={`0 0 ${SITE_SYMBOL_SIZE} ${SITE_SYMBOL_SIZE}`} aria-hidden="true" className="shrink-0" data-shape={spec.shape}>
      <polygon
        points={points}
        fill={spec.hollow ? '#ffffff' : spec.colour}
        stroke={spec.colour}
        strokeWidth={spec.hollow ? SITE_RING_WIDTH : 0}
        strokeLinejoin="miter"
        // The map draws the ring inside the outline; an SVG stroke is centred on it, so shrink by half a ring.
        transform={spec.hollow ? `translate(${SITE_SYMBOL_SIZE / 2} ${SITE_SYMBOL_SIZE / 2}) scale(0.87) translate(${-SITE_SYMBOL_SIZE / 2} ${-SITE_SYMBOL_SIZE / 2})` : undefined}
      />
    </svg>
  );
}

/**
 * The key for the sites on the map: one row per kind with its symbol and how many are shown.
 * @param props the sites on the map
 * @returns the legend
 * @example <SiteLegend sites={sites} />
 */
export function SiteLegend({ sites }: { sites: readonly MapSite[] }) {
  const counts = new Map<MapSiteKind, number>();
  for (const site of sites) counts.set(site.kind, (counts.get(site.kind) ?? 0) + 1);
  return (
    <figure className="flex flex-col gap-1.5 text-xs text-ink">
      <figcaption className="font-semibold">Sites</figcaption>
      <ul className="flex flex-col gap-1" aria-label="Site symbols">
        {siteKinds.map((kind) => (
          <li key={kind} className="flex items-center gap-2">
            <SiteSymbol kind={kind} />
            <span>{siteSymbolSpecs[kind].label}</span>
            <span className="text-ink-muted tabular-nums">({counts.get(kind) ?? 0})</span>
          </li>
        ))}
      </ul>
      {sites.length === 0 ? <p className="text-ink-muted">No sites yet.</p> : null}
    </figure>
  );
}

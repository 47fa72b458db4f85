import type { Map as MapLibreMap } from 'maplibre-gl';
import { useEffect, useMemo, useRef } from 'react';
import { siteLabelAdd } from '../lib/map-instance';
import { idleCursor, siteInteractionsBind, type SiteHandlers } from '../lib/site-interactions';
import { siteLayerSync, siteSourceSet } from '../lib/site-layers';
import type { MapSite } from '../types';
import { siteFeatureCollection, siteFeatureMoved, siteLabelsShown } from '../utils/site-geojson';
import { SITE_SYMBOL_SIZE } from '../utils/site-symbols';

export type SitesOnMap = SiteHandlers & {
  sites?: readonly MapSite[] | null;
  selectedSiteId?: string | null;
};

/**
 * Keeps a map's sites layer, labels, cursor and pointer handling in step with the props.
 * @param map the map once loaded (null before)
 * @param props sites, the selected one and the handlers
 * @param raiseAfter values whose change adds other layers; the sites are moved back on top after them
 * @returns nothing
 * @example useSitesOnMap(map, props, [props.contours, props.customerBins]);
 */
export function useSitesOnMap(map: MapLibreMap | null, props: SitesOnMap, raiseAfter: readonly unknown[]): void {
  const handlers = useRef<SiteHandlers>(props);
  handlers.current = props;
  const collection = useMemo(() => (props.sites ? siteFeatureCollection(props.sites) : null), [props.sites]);
  const drawn = useRef(collection);
  drawn.current = collection;
  const labels = useRef(new Map<string, { move: (lngLat: [number, number]) => void; remove: () => void }>());

  useEffect(() => {
    if (!map) return;
    return siteInteractionsBind(
      map,
      () => handlers.current,
      (drag) => {
        // The dragged position stays drawn after release until the moved site comes back in the props.
        if (!drag || !drawn.current) return;
        siteSourceSet(map, siteFeatureMoved(drawn.current, drag.id, drag.lonLat));
        labels.current.get(drag.id)?.move([drag.lonLat.lon, drag.lonLat.lat]);
      },
    );
  }, [map]);

  useEffect(() => {
    if (map) siteLayerSync(map, collection, props.selectedSiteId ?? null);
  }, [map, collection, props.selectedSiteId, ...raiseAfter]);

  useEffect(() => {
    if (!map || !props.sites) return;
    const shown = labels.current;
    for (const site of siteLabelsShown(props.sites, props.selectedSiteId)) {
      const element = document.createElement('span');
      element.textContent = site.label?.trim() ? site.label : site.name;
      const selected = site.id === props.selectedSiteId;
      element.className = `pointer-events-none select-none whitespace-nowrap text-[11px] tracking-wide text-ink ${selected || site.label ? 'font-semibold' : ''}`;
      element.style.textShadow = '0 0 2px #ffffff, 0 0 2px #ffffff, 0 0 3px #ffffff';
      shown.set(site.id, siteLabelAdd(element, [site.lon, site.lat], map, SITE_SYMBOL_SIZE / 2));
    }
    return () => {
      shown.forEach((label) => label.remove());
      shown.clear();
    };
  }, [map, props.sites, props.selectedSiteId]);

  const adding = props.onMapClickAdd !== undefined;
  useEffect(() => {
    if (map) map.getCanvas().style.cursor = idleCursor({ onMapClickAdd: adding ? () => undefined : undefined });
  }, [map, adding]);
}

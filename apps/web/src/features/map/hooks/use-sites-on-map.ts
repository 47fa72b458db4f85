import type { Map as MapLibreMap } from 'maplibre-gl';
import { useEffect, useMemo, useRef } from 'react';
import { siteLabelAdd } from '../lib/map-instance';
import { idleCursor, siteInteractionsBind, type SiteHandlers } from '../lib/site-interactions';
import { siteLayerSync, siteSourceSet } from '../lib/site-layers';
import type { MapSite } from '../types';
import { labelsPlaced, labelWidthEstimate } from '../utils/label-placement';
import { siteFeatureCollection, siteFeatureMoved, siteLabelsShown } from '../utils/site-geojson';
import { SITE_SYMBOL_SIZE } from '../utils/site-symbols';

type SiteLabel = { element: HTMLElement; lngLat: [number, number]; move: (lngLat: [number, number]) => void; remove: () => void };

const LABEL_OFFSET = SITE_SYMBOL_SIZE / 2;

/** Shows the labels that fit without overlapping (in the order they were added: priority order). */
function labelsArrange(map: MapLibreMap, labels: Map<string, SiteLabel>): void {
  const boxes = [...labels].map(([id, label]) => {
    const point = map.project(label.lngLat);
    const text = label.element.textContent ?? '';
    return { id, x: point.x, y: point.y + LABEL_OFFSET, width: label.element.offsetWidth || labelWidthEstimate(text), height: label.element.offsetHeight || 14 };
  });
  const shown = labelsPlaced(boxes);
  for (const [id, label] of labels) label.element.style.visibility = shown.has(id) ? 'visible' : 'hidden';
}

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
  const labels = useRef(new Map<string, SiteLabel>());

  useEffect(() => {
    if (!map) return;
    return siteInteractionsBind(
      map,
      () => handlers.current,
      (drag) => {
        // The dragged position stays drawn after release until the moved site comes back in the props.
        if (!drag || !drawn.current) return;
        siteSourceSet(map, siteFeatureMoved(drawn.current, drag.id, drag.lonLat));
        const label = labels.current.get(drag.id);
        label?.move([drag.lonLat.lon, drag.lonLat.lat]);
        if (label) label.lngLat = [drag.lonLat.lon, drag.lonLat.lat];
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
      const lngLat: [number, number] = [site.lon, site.lat];
      shown.set(site.id, { element, lngLat, ...siteLabelAdd(element, lngLat, map, LABEL_OFFSET) });
    }
    const arrange = () => labelsArrange(map, shown);
    arrange();
    map.on('moveend', arrange);
    return () => {
      map.off('moveend', arrange);
      shown.forEach((label) => label.remove());
      shown.clear();
    };
  }, [map, props.sites, props.selectedSiteId]);

  const adding = props.onMapClickAdd !== undefined;
  useEffect(() => {
    if (map) map.getCanvas().style.cursor = idleCursor({ onMapClickAdd: adding ? () => undefined : undefined });
  }, [map, adding]);
}

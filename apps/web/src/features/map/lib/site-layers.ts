import type { FeatureCollection, Point } from 'geojson';
import type { GeoJSONSource, Map as MapLibreMap } from 'maplibre-gl';
import { siteIconId, type SiteFeatureProperties } from '../utils/site-geojson';
import { siteKinds, siteSymbolImage } from '../utils/site-symbols';

/** Ids of the sites source and layers (drawn above every other layer). */
export const siteLayerIds = {
  source: 'ds-sites',
  symbols: 'ds-sites',
  selected: 'ds-sites-selected',
} as const;

/** Ring around the selected site: the theme's ink, readable on the basemap and on the surface. */
export const SELECTED_RING_COLOUR = '#1f2b38';

const PIXEL_RATIO = 2;

function symbolsAdd(map: MapLibreMap): void {
  for (const kind of siteKinds) {
    const id = siteIconId(kind);
    if (!map.hasImage(id)) map.addImage(id, siteSymbolImage(kind, PIXEL_RATIO), { pixelRatio: PIXEL_RATIO });
  }
}

/**
 * Shows the sites (or removes them with `null`): one GeoJSON source, a ring under the selected
 * site, and a symbol layer whose icons are our own images (no sprite or glyph files; names are HTML
 * labels). Both layers are moved to the top so later layers (contours, customers) never hide them.
 * @param map the map (style loaded)
 * @param sites the collection from `siteFeatureCollection`, or null to remove
 * @param selectedId the selected site, ringed
 * @returns nothing
 * @example siteLayerSync(map, siteFeatureCollection(sites), 's1')
 */
export function siteLayerSync(map: MapLibreMap, sites: FeatureCollection<Point, SiteFeatureProperties> | null, selectedId: string | null): void {
  if (!sites) {
    for (const id of [siteLayerIds.symbols, siteLayerIds.selected]) if (map.getLayer(id)) map.removeLayer(id);
    if (map.getSource(siteLayerIds.source)) map.removeSource(siteLayerIds.source);
    return;
  }
  symbolsAdd(map);
  const source = map.getSource(siteLayerIds.source) as GeoJSONSource | undefined;
  if (source) source.setData(sites);
  else map.addSource(siteLayerIds.source, { type: 'geojson', data: sites });
  const selectedFilter = ['==', ['get', 'id'], selectedId ?? ''] as ['==', ['get', string], string];
  if (!map.getLayer(siteLayerIds.selected)) {
    map.addLayer({
      id: siteLayerIds.selected,
      type: 'circle',
      source: siteLayerIds.source,
      filter: selectedFilter,
      paint: { 'circle-radius': 17, 'circle-color': 'rgba(255,255,255,0.55)', 'circle-stroke-color': SELECTED_RING_COLOUR, 'circle-stroke-width': 2.5 },
    });
  } else map.setFilter(siteLayerIds.selected, selectedFilter);
  if (!map.getLayer(siteLayerIds.symbols)) {
    map.addLayer({
      id: siteLayerIds.symbols,
      type: 'symbol',
      source: siteLayerIds.source,
      layout: {
        'icon-image': ['get', 'icon'],
        'icon-allow-overlap': true,
        'icon-ignore-placement': true,
        'symbol-sort-key': ['get', 'order'],
      },
    });
  }
  map.moveLayer(siteLayerIds.selected);
  map.moveLayer(siteLayerIds.symbols);
}

/**
 * Replaces the drawn sites without touching the layers (the live position while a site is dragged).
 * @param map the map
 * @param sites the collection to draw
 * @returns nothing
 * @example siteSourceSet(map, siteFeatureMoved(collection, id, lonLat))
 */
export function siteSourceSet(map: MapLibreMap, sites: FeatureCollection<Point, SiteFeatureProperties>): void {
  (map.getSource(siteLayerIds.source) as GeoJSONSource | undefined)?.setData(sites);
}

import type { FeatureCollection, Geometry } from 'geojson';
import type { ExpressionSpecification, GeoJSONSource, Map as MapLibreMap } from 'maplibre-gl';
import { SURFACE_BEFORE_LAYER } from './basemap-style';

/** Corners of an image source: NW, NE, SE, SW. */
type Corners = [[number, number], [number, number], [number, number], [number, number]];

/** Ids of the layers and sources this feature adds on top of any basemap. */
export const mapLayerIds = {
  surface: 'ds-surface',
  contours: 'ds-contours',
  customers: 'ds-customers',
  customersOutline: 'ds-customers-outline',
} as const;

/** Contour line styles per percent: solid, dashed, dotted, so they read without colour. */
export const contourDash: Record<number, number[] | undefined> = { 50: undefined, 75: [4, 2], 90: [1, 2] };

/** Contour line colour: the theme's ink, dark on both ends of the ramp's light half and the basemap. */
export const CONTOUR_COLOUR = '#1f2b38';

/** The canvas each map's surface source was made from (a new canvas means a new source). */
const shownCanvas = new WeakMap<MapLibreMap, HTMLCanvasElement>();

function beforeId(map: MapLibreMap, preferred: string): string | undefined {
  return map.getLayer(preferred) ? preferred : undefined;
}

function layerRemove(map: MapLibreMap, ...ids: string[]): void {
  for (const id of ids) if (map.getLayer(id)) map.removeLayer(id);
}

/**
 * Shows (or replaces, or removes with `null`) a coloured raster as a canvas source between the
 * basemap's areas and its rivers and roads. A new canvas replaces the source (canvas sources cannot swap canvases).
 * @param map the map (style loaded)
 * @param image the painted canvas and its corners, or null to remove
 * @param opacity 0–1
 * @returns nothing
 * @example surfaceLayerSync(map, { canvas, corners: rasterCorners(raster.bounds) }, 0.8)
 */
export function surfaceLayerSync(map: MapLibreMap, image: { canvas: HTMLCanvasElement; corners: Corners } | null, opacity: number): void {
  const id = mapLayerIds.surface;
  if (!image || shownCanvas.get(map) !== image.canvas) {
    layerRemove(map, id);
    if (map.getSource(id)) map.removeSource(id);
    shownCanvas.delete(map);
  }
  if (!image) return;
  if (!map.getSource(id)) {
    map.addSource(id, { type: 'canvas', canvas: image.canvas, coordinates: image.corners, animate: false });
    shownCanvas.set(map, image.canvas);
  }
  if (!map.getLayer(id)) {
    map.addLayer(
      // Nearest resampling: the colour under the cursor is the value the read-out shows.
      { id, type: 'raster', source: id, paint: { 'raster-opacity': opacity, 'raster-fade-duration': 0, 'raster-resampling': 'nearest' } },
      beforeId(map, SURFACE_BEFORE_LAYER),
    );
  } else map.setPaintProperty(id, 'raster-opacity', opacity);
}

/**
 * Shows the percent-volume contours, one line layer per percent, each switchable.
 * @param map the map (style loaded)
 * @param contours GeoJSON with `properties.percent`, or null to remove
 * @param visible which percents are switched on
 * @returns nothing
 * @example contourLayersSync(map, contours, { 50: true, 75: true, 90: false })
 */
export function contourLayersSync(map: MapLibreMap, contours: FeatureCollection | null, visible: Record<number, boolean>): void {
  const id = mapLayerIds.contours;
  const percents = Object.keys(contourDash).map(Number);
  if (!contours) {
    layerRemove(map, ...percents.map((p) => `${id}-${p}`));
    if (map.getSource(id)) map.removeSource(id);
    return;
  }
  const source = map.getSource(id) as GeoJSONSource | undefined;
  if (source) source.setData(contours);
  else map.addSource(id, { type: 'geojson', data: contours });
  for (const percent of percents) {
    const layerId = `${id}-${percent}`;
    if (!map.getLayer(layerId)) {
      map.addLayer({
        id: layerId,
        type: 'line',
        source: id,
        filter: ['==', ['get', 'percent'], percent],
        layout: { 'line-join': 'round' },
        paint: {
          'line-color': CONTOUR_COLOUR,
          'line-width': percent === 50 ? 2 : 1.5,
          ...(contourDash[percent] ? { 'line-dasharray': contourDash[percent] } : {}),
        },
      });
    }
    map.setLayoutProperty(layerId, 'visibility', visible[percent] ? 'visible' : 'none');
  }
}

/**
 * Shows aggregated customer bins as a fill layer coloured by customer count.
 * @param map the map (style loaded)
 * @param bins the aggregate GeoJSON, or null to remove
 * @param colours `[count, colour]` stops from 0 to the largest count
 * @returns nothing
 * @example customerLayerSync(map, bins, [[0, '#f7fcf0'], [420, '#084081']])
 */
export function customerLayerSync(map: MapLibreMap, bins: FeatureCollection<Geometry> | null, colours: Array<[number, string]>): void {
  const id = mapLayerIds.customers;
  if (!bins) {
    layerRemove(map, mapLayerIds.customersOutline, id);
    if (map.getSource(id)) map.removeSource(id);
    return;
  }
  const source = map.getSource(id) as GeoJSONSource | undefined;
  if (source) source.setData(bins);
  else map.addSource(id, { type: 'geojson', data: bins });
  const fill = ['interpolate', ['linear'], ['get', 'count'], ...colours.flat()] as unknown as ExpressionSpecification;
  if (!map.getLayer(id)) {
    map.addLayer({ id, type: 'fill', source: id, paint: { 'fill-color': fill, 'fill-opacity': 0.55 } }, beforeId(map, SURFACE_BEFORE_LAYER));
    map.addLayer(
      { id: mapLayerIds.customersOutline, type: 'line', source: id, paint: { 'line-color': '#ffffff', 'line-width': 0.5, 'line-opacity': 0.6 } },
      beforeId(map, SURFACE_BEFORE_LAYER),
    );
  } else map.setPaintProperty(id, 'fill-color', fill);
}

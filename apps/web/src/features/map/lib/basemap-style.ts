import type { FeatureCollection, Geometry } from 'geojson';
import type { StyleSpecification } from 'maplibre-gl';

/** Demo basemap colours: a pale sea, warm paper land, quiet outlines, so the density ramp stands out. */
export const basemapColours = {
  sea: '#dde7ec',
  land: '#f7f5ef',
  districtFill: '#f0ece2',
  districtLine: '#d6cfbf',
  river: '#a8c4d2',
  roadMain: '#ffffff',
  roadMainCasing: '#d9cdb6',
  roadSecondary: '#ece4d4',
} as const;

/** The layer the surface raster goes under, so rivers and roads stay readable over the colours. */
export const SURFACE_BEFORE_LAYER = 'basemap-river';

/**
 * The MapLibre style for the offline demo basemap: one GeoJSON source, fill and line layers, no tiles,
 * glyphs or sprites (district names are HTML markers, see `map-canvas.tsx`).
 * @param basemap the generated Quillport GeoJSON (features carry `properties.layer`)
 * @returns a complete style
 * @example mapInstanceCreate(container, demoBasemapStyle(basemap))
 */
export function demoBasemapStyle(basemap: FeatureCollection<Geometry, { layer: string }>): StyleSpecification {
  const only = (layer: string) => ['==', ['get', 'layer'], layer] as ['==', ['get', string], string];
  return {
    version: 8,
    name: 'Demandscape demo basemap (Quillport, invented)',
    sources: { basemap: { type: 'geojson', data: basemap } },
    layers: [
      { id: 'basemap-sea', type: 'background', paint: { 'background-color': basemapColours.sea } },
      { id: 'basemap-land', type: 'fill', source: 'basemap', filter: only('land'), paint: { 'fill-color': basemapColours.land } },
      { id: 'basemap-districts', type: 'fill', source: 'basemap', filter: only('district'), paint: { 'fill-color': basemapColours.districtFill } },
      {
        id: 'basemap-district-lines',
        type: 'line',
        source: 'basemap',
        filter: only('district'),
        paint: { 'line-color': basemapColours.districtLine, 'line-width': 1, 'line-dasharray': [3, 2] },
      },
      {
        id: SURFACE_BEFORE_LAYER,
        type: 'line',
        source: 'basemap',
        filter: only('river'),
        layout: { 'line-cap': 'round', 'line-join': 'round' },
        paint: { 'line-color': basemapColours.river, 'line-width': ['interpolate', ['linear'], ['zoom'], 9, 1.5, 14, 6] },
      },
      {
        id: 'basemap-roads-secondary',
        type: 'line',
        source: 'basemap',
        filter: ['all', only('road'), ['==', ['get', 'kind'], 'secondary']],
        layout: { 'line-cap': 'round', 'line-join': 'round' },
        paint: { 'line-color': basemapColours.roadSecondary, 'line-width': ['interpolate', ['linear'], ['zoom'], 9, 0.8, 14, 3] },
      },
      {
        id: 'basemap-roads-main-casing',
        type: 'line',
        source: 'basemap',
        filter: ['all', only('road'), ['==', ['get', 'kind'], 'main']],
        layout: { 'line-cap': 'round', 'line-join': 'round' },
        paint: { 'line-color': basemapColours.roadMainCasing, 'line-width': ['interpolate', ['linear'], ['zoom'], 9, 2, 14, 7] },
      },
      {
        id: 'basemap-roads-main',
        type: 'line',
        source: 'basemap',
        filter: ['all', only('road'), ['==', ['get', 'kind'], 'main']],
        layout: { 'line-cap': 'round', 'line-join': 'round' },
        paint: { 'line-color': basemapColours.roadMain, 'line-width': ['interpolate', ['linear'], ['zoom'], 9, 1, 14, 4.5] },
      },
    ],
  };
}

/**
 * District and water names from the demo basemap, for HTML labels.
 * @param basemap the generated GeoJSON
 * @returns name, position and kind of each label point
 * @example basemapLabels(basemap)[0] // { name: 'Harbour Steps', lngLat: [-38.49, 44.49], kind: 'district' }
 */
export function basemapLabels(basemap: FeatureCollection<Geometry, { layer: string; name?: string }>) {
  return basemap.features.flatMap((f) => {
    const kind = f.properties.layer === 'district-label' ? 'district' : f.properties.layer === 'water-label' ? 'water' : null;
    if (!kind || f.geometry.type !== 'Point' || !f.properties.name) return [];
    return [{ name: f.properties.name, lngLat: f.geometry.coordinates as [number, number], kind }];
  });
}

import maplibregl, { type Map as MapLibreMap, type StyleSpecification } from 'maplibre-gl';
import 'maplibre-gl/dist/maplibre-gl.css';

/**
 * Everything that needs a real browser (WebGL, canvas) sits in this module, so component tests can
 * replace it; all map logic around it stays testable.
 */

/**
 * Creates the MapLibre map. Offline: attribution of our own demo data only, no external requests.
 * @param container the element to draw into
 * @param style a style object or a style URL (production)
 * @param view initial centre and zoom
 * @returns the map
 * @example const map = mapInstanceCreate(div, demoBasemapStyle(basemap), { center: [-38.5, 44.5], zoom: 11 });
 */
export function mapInstanceCreate(container: HTMLElement, style: StyleSpecification | string, view: { center: [number, number]; zoom: number }): MapLibreMap {
  return new maplibregl.Map({
    container,
    style,
    center: view.center,
    zoom: view.zoom,
    attributionControl: false,
    dragRotate: false,
    pitchWithRotate: false,
    cooperativeGestures: false,
  });
}

/**
 * Places an HTML element on the map (district names without glyph files).
 * @param element the label element
 * @param lngLat where it goes
 * @param map the map
 * @returns a function that removes it
 * @example const remove = markerAdd(span, [-38.5, 44.5], map);
 */
export function markerAdd(element: HTMLElement, lngLat: [number, number], map: MapLibreMap): () => void {
  const marker = new maplibregl.Marker({ element, anchor: 'center' }).setLngLat(lngLat).addTo(map);
  return () => marker.remove();
}

/**
 * Paints RGBA bytes on a canvas for a MapLibre canvas source. A canvas, not a data/blob URL: MapLibre
 * fetches image URLs, and the server's Content-Security-Policy rightly allows no `connect-src data:`.
 * @param rgba 4 bytes per pixel, row 0 at the top
 * @param width pixels
 * @param height pixels
 * @returns the painted canvas (not attached to the page)
 * @example canvasFromRgba(rasterRgba(values, table, scale), raster.width, raster.height)
 */
export function canvasFromRgba(rgba: Uint8ClampedArray, width: number, height: number): HTMLCanvasElement {
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const context = canvas.getContext('2d');
  if (!context) throw new Error('This browser cannot draw on a canvas, so the demand surface cannot be shown. Try a current Chrome, Firefox or Safari.');
  const image = context.createImageData(width, height);
  image.data.set(rgba);
  context.putImageData(image, 0, 0);
  return canvas;
}

/**
 * Places a site's name (or rank) under its symbol as an HTML label (no glyph files needed).
 * @param element the label element
 * @param lngLat the site's position
 * @param map the map
 * @param offsetY pixels below the point (clears the symbol)
 * @returns `move` to follow a drag and `remove`
 * @example const label = siteLabelAdd(span, [-38.5, 44.5], map, 13); label.move([-38.49, 44.5]);
 */
export function siteLabelAdd(element: HTMLElement, lngLat: [number, number], map: MapLibreMap, offsetY: number) {
  const marker = new maplibregl.Marker({ element, anchor: 'top', offset: [0, offsetY] }).setLngLat(lngLat).addTo(map);
  return { move: (next: [number, number]) => void marker.setLngLat(next), remove: () => void marker.remove() };
}

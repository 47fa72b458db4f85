import { Alert } from '@demandscape/ui';
import type { FeatureCollection, Geometry } from 'geojson';
import type { Map as MapLibreMap, StyleSpecification } from 'maplibre-gl';
import { useEffect, useRef, useState } from 'react';
import { basemapLabels } from '../lib/basemap-style';
import { contourLayersSync, customerLayerSync, mapLayerIds, surfaceLayerSync } from '../lib/map-layers';
import { mapInstanceCreate, markerAdd } from '../lib/map-instance';
import { useSitesOnMap, type SitesOnMap } from '../hooks/use-sites-on-map';

type Corners = [[number, number], [number, number], [number, number], [number, number]];

export type MapCanvasProps = {
  /** The basemap: the demo style object, or a production style URL. */
  style: StyleSpecification | string;
  /** The demo basemap's GeoJSON, for HTML district labels (none with a production style). */
  labelsFrom?: FeatureCollection<Geometry, { layer: string; name?: string }> | null;
  /** Where to look first; the map fits `fitBounds` instead when given. */
  initialView: { center: [number, number]; zoom: number };
  /** West, south, east, north to fit once per `fitKey` (the surface's extent). */
  fitBounds?: [number, number, number, number] | null;
  fitKey?: string | null;
  surfaceImage?: { canvas: HTMLCanvasElement; corners: Corners } | null;
  surfaceOpacity?: number;
  contours?: FeatureCollection | null;
  contourVisible?: Record<number, boolean>;
  customerBins?: FeatureCollection<Geometry> | null;
  customerColours?: Array<[number, string]>;
  /** Called with the cursor's position over the map, or null when it leaves. */
  onHover?: (lngLat: { lng: number; lat: number } | null) => void;
  /** Called with the whole zoom level after each zoom (the customer bins depend on it). */
  onZoom?: (zoom: number) => void;
  /** Receives the map once its style has loaded, and null when it goes (camera sync in side-by-side). */
  onMapReady?: (map: MapLibreMap | null) => void;
  label: string;
} & SitesOnMap;

/**
 * The one component that owns a MapLibre instance: creates it, listens for its `error` event, keeps
 * the surface, contour, customer and site layers in step with the props, and removes it on unmount.
 * @param props style, layers and callbacks
 * @returns the map element (with an error message above it when the map reports one)
 * @example <MapCanvas style={demoBasemapStyle(basemap)} initialView={{ center: [-38.5, 44.5], zoom: 11 }} label="Demand surface map" />
 */
export function MapCanvas(props: MapCanvasProps) {
  const container = useRef<HTMLDivElement>(null);
  const [map, setMap] = useState<MapLibreMap | null>(null);
  const [error, setError] = useState<string | null>(null);
  const callbacks = useRef(props);
  callbacks.current = props;

  useEffect(() => {
    if (!container.current) return;
    const instance = mapInstanceCreate(container.current, props.style, props.initialView);
    instance.on('error', (event: { error?: Error }) => {
      const message = event.error?.message ?? 'The map reported a problem it did not explain.';
      setError(message.length > 300 ? `${message.slice(0, 300)}…` : message);
    });
    instance.on('load', () => {
      setMap(instance);
      callbacks.current.onMapReady?.(instance);
    });
    instance.on('mousemove', (event: { lngLat: { lng: number; lat: number } }) => callbacks.current.onHover?.(event.lngLat));
    instance.on('mouseout', () => callbacks.current.onHover?.(null));
    instance.on('zoomend', () => callbacks.current.onZoom?.(Math.round(instance.getZoom())));
    return () => {
      callbacks.current.onMapReady?.(null);
      setMap(null);
      instance.remove();
    };
    // The style and first view are read once; a new style means a new map (give it a new `key`).
  }, []);

  useEffect(() => {
    if (!map || !props.labelsFrom) return;
    const removers = basemapLabels(props.labelsFrom).map((label) => {
      const element = document.createElement('span');
      element.textContent = label.name;
      element.className =
        label.kind === 'water'
          ? 'pointer-events-none select-none whitespace-nowrap text-[11px] italic tracking-wide text-accent-strong/70'
          : 'pointer-events-none select-none whitespace-nowrap text-[11px] font-semibold tracking-wide text-ink-muted uppercase';
      // A paper-coloured halo keeps names legible over the surface colours.
      element.style.textShadow = '0 0 2px #f7f5ef, 0 0 2px #f7f5ef, 0 0 3px #f7f5ef';
      return markerAdd(element, label.lngLat, map);
    });
    return () => removers.forEach((remove) => remove());
  }, [map, props.labelsFrom]);

  useEffect(() => {
    if (!map || !props.fitBounds) return;
    const [w, s, e, n] = props.fitBounds;
    map.fitBounds([[w, s], [e, n]], { padding: 24, duration: 0 });
    // Fit once per surface (fitKey), not on every render.
  }, [map, props.fitKey]);

  useEffect(() => {
    if (!map) return;
    surfaceLayerSync(map, props.surfaceImage ?? null, props.surfaceOpacity ?? 0.8);
    // An image decoded while the map sits idle is not drawn until something moves (seen in Chromium); draw once more.
    const redraw = (event: { sourceId?: string }) => {
      if (event.sourceId === mapLayerIds.surface) map.triggerRepaint();
    };
    map.on('sourcedata', redraw);
    return () => {
      map.off('sourcedata', redraw);
    };
  }, [map, props.surfaceImage, props.surfaceOpacity]);

  useEffect(() => {
    if (map) contourLayersSync(map, props.contours ?? null, props.contourVisible ?? {});
  }, [map, props.contours, props.contourVisible]);

  useEffect(() => {
    if (map) customerLayerSync(map, props.customerBins ?? null, props.customerColours ?? []);
  }, [map, props.customerBins, props.customerColours]);

  // Declared after the other layers so the sites are raised above whatever they add.
  useSitesOnMap(map, props, [props.surfaceImage, props.contours, props.customerBins]);

  return (
    <div className="relative h-full min-h-80">
      {error ? (
        <div className="absolute inset-x-2 top-2 z-10">
          <Alert tone="danger" title="The map could not draw everything">
            {error}
          </Alert>
        </div>
      ) : null}
      {/* MapLibre makes its container position: relative, so it is sized by height, not by inset. */}
      <div ref={container} role="region" aria-label={props.label} className="h-full w-full overflow-hidden rounded-panel border border-line" />
      {props.onMapClickAdd ? (
        <p className="pointer-events-none absolute bottom-2 left-2 z-10 rounded-control bg-surface/95 px-2.5 py-1.5 text-xs font-medium text-ink shadow-panel">
          Click the map where the new site goes.
        </p>
      ) : null}
    </div>
  );
}

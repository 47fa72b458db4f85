import type { Map as MapLibreMap, MapLayerMouseEvent, MapLayerTouchEvent, MapMouseEvent, MapTouchEvent } from 'maplibre-gl';
import type { MapLonLat } from '../types';
import { siteLayerIds } from './site-layers';

/** What the map does with pointer input on sites; read at event time, so they may change freely. */
export type SiteHandlers = {
  onSiteSelect?: (id: string) => void;
  /** When set, a click on empty map reports its position (the "add on the map" mode). */
  onMapClickAdd?: (lonLat: MapLonLat) => void;
  /** When set, sites can be dragged; called once on release with the new position. */
  onSiteMove?: (id: string, lonLat: MapLonLat) => void;
};

/** Called with the live position while a site is dragged, and with null when the drag ends. */
export type SiteDragPreview = (drag: { id: string; lonLat: MapLonLat } | null) => void;

type PointerEvent = MapMouseEvent | MapTouchEvent;

function siteIdAt(event: MapLayerMouseEvent | MapLayerTouchEvent): string | null {
  const id = event.features?.[0]?.properties?.id;
  return typeof id === 'string' ? id : null;
}

function lonLatOf(event: PointerEvent): MapLonLat {
  return { lon: event.lngLat.lng, lat: event.lngLat.lat };
}

/**
 * The cursor the map shows when the pointer is not over a site.
 * @param handlers the current handlers
 * @returns 'crosshair' in the add mode, '' (MapLibre's own hand) otherwise
 * @example map.getCanvas().style.cursor = idleCursor(handlers);
 */
export function idleCursor(handlers: SiteHandlers): string {
  return handlers.onMapClickAdd ? 'crosshair' : '';
}

/**
 * Wires clicks and drags on the sites layer: a click on a site selects it; a click elsewhere in the
 * add mode reports the position; when moving is allowed, press on a site, drag, release → one
 * `onSiteMove`, with `preview` following the pointer meanwhile. Mouse and single-finger touch.
 * @param map the map
 * @param handlers returns the current handlers (a ref, so the wiring is done once)
 * @param preview shows the dragged position
 * @returns a function that removes every listener
 * @example const unbind = siteInteractionsBind(map, () => props.current, (drag) => redraw(drag));
 */
export function siteInteractionsBind(map: MapLibreMap, handlers: () => SiteHandlers, preview: SiteDragPreview): () => void {
  const canvas = () => map.getCanvas();
  let dragging: { id: string; last: MapLonLat | null } | null = null;

  const onSiteClick = (event: MapLayerMouseEvent) => {
    const id = siteIdAt(event);
    if (id) handlers().onSiteSelect?.(id);
  };
  const onMapClick = (event: MapMouseEvent) => {
    const add = handlers().onMapClickAdd;
    if (!add) return;
    // A click on a site selects it; only empty map adds.
    if (map.queryRenderedFeatures(event.point, { layers: [siteLayerIds.symbols] }).length > 0) return;
    add(lonLatOf(event));
  };
  const onEnter = () => {
    canvas().style.cursor = handlers().onSiteMove ? 'move' : 'pointer';
  };
  const onLeave = () => {
    if (!dragging) canvas().style.cursor = idleCursor(handlers());
  };

  const onDragMove = (event: PointerEvent) => {
    if (!dragging) return;
    dragging.last = lonLatOf(event);
    canvas().style.cursor = 'grabbing';
    preview({ id: dragging.id, lonLat: dragging.last });
  };
  const onDragEnd = () => {
    map.off('mousemove', onDragMove);
    map.off('touchmove', onDragMove);
    const done = dragging;
    dragging = null;
    canvas().style.cursor = idleCursor(handlers());
    if (!done?.last) return;
    preview(null);
    handlers().onSiteMove?.(done.id, done.last);
    handlers().onSiteSelect?.(done.id);
  };
  const onDragStart = (event: MapLayerMouseEvent | MapLayerTouchEvent) => {
    const id = siteIdAt(event);
    if (!id || !handlers().onSiteMove) return;
    if ('points' in event && event.points.length !== 1) return;
    // Stops the map from panning while the site moves.
    event.preventDefault();
    dragging = { id, last: null };
    if (event.type === 'touchstart') {
      map.on('touchmove', onDragMove);
      map.once('touchend', onDragEnd);
    } else {
      map.on('mousemove', onDragMove);
      map.once('mouseup', onDragEnd);
    }
  };

  map.on('click', siteLayerIds.symbols, onSiteClick);
  map.on('click', onMapClick);
  map.on('mouseenter', siteLayerIds.symbols, onEnter);
  map.on('mouseleave', siteLayerIds.symbols, onLeave);
  map.on('mousedown', siteLayerIds.symbols, onDragStart);
  map.on('touchstart', siteLayerIds.symbols, onDragStart);
  return () => {
    map.off('click', siteLayerIds.symbols, onSiteClick);
    map.off('click', onMapClick);
    map.off('mouseenter', siteLayerIds.symbols, onEnter);
    map.off('mouseleave', siteLayerIds.symbols, onLeave);
    map.off('mousedown', siteLayerIds.symbols, onDragStart);
    map.off('touchstart', siteLayerIds.symbols, onDragStart);
    map.off('mousemove', onDragMove);
    map.off('touchmove', onDragMove);
  };
}

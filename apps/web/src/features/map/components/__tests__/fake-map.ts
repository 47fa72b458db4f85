/**
 * A stand-in for the MapLibre map at the component boundary (WebGL does not run in happy-dom):
 * it keeps sources, layers and properties the way the real map would, and fires events on demand.
 */
export class FakeMap {
  sources = new Map<string, Record<string, unknown>>();
  layers = new Map<string, { spec: Record<string, unknown>; before?: string; layout: Record<string, unknown>; paint: Record<string, unknown> }>();
  handlers = new Map<string, Array<(event?: unknown) => void>>();
  zoom = 11;
  removed = false;
  images = new Map<string, { image: { width: number; height: number; data: Uint8ClampedArray }; options?: unknown }>();
  canvas = { style: { cursor: '' } };
  /** What `queryRenderedFeatures` answers (tests set the sites under the pointer). */
  featuresUnderPointer: Array<{ properties: Record<string, unknown> }> = [];

  constructor(style?: unknown) {
    // A style object's layers exist once it has loaded, as on the real map; a style URL brings none here.
    if (typeof style === 'object' && style && 'layers' in style) {
      for (const layer of (style as { layers: Array<Record<string, unknown> & { id: string }> }).layers) this.addLayer(layer);
    }
  }

  /** `on(event, handler)` or, for events on one layer, `on(event, layerId, handler)` (kept as `event:layerId`). */
  on(event: string, layerOrHandler: string | ((event?: unknown) => void), maybeHandler?: (event?: unknown) => void) {
    const [key, handler] = typeof layerOrHandler === 'string' ? [`${event}:${layerOrHandler}`, maybeHandler!] : [event, layerOrHandler];
    this.handlers.set(key, [...(this.handlers.get(key) ?? []), handler]);
    return this;
  }
  once(event: string, handler: (event?: unknown) => void) {
    const wrapped = (payload?: unknown) => {
      this.off(event, wrapped);
      handler(payload);
    };
    return this.on(event, wrapped);
  }
  off(event: string, layerOrHandler: string | ((event?: unknown) => void), maybeHandler?: (event?: unknown) => void) {
    const [key, handler] = typeof layerOrHandler === 'string' ? [`${event}:${layerOrHandler}`, maybeHandler!] : [event, layerOrHandler];
    this.handlers.set(key, (this.handlers.get(key) ?? []).filter((h) => h !== handler));
    return this;
  }
  fire(event: string, payload?: unknown) {
    for (const handler of this.handlers.get(event) ?? []) handler(payload);
  }
  getSource(id: string) {
    const source = this.sources.get(id);
    if (!source) return undefined;
    return {
      ...source,
      updateImage: (next: Record<string, unknown>) => this.sources.set(id, { ...source, ...next }),
      setData: (data: unknown) => this.sources.set(id, { ...source, data }),
    };
  }
  addSource(id: string, source: Record<string, unknown>) {
    if (this.sources.has(id)) throw new Error(`There is already a source with ID "${id}".`);
    this.sources.set(id, source);
  }
  removeSource(id: string) {
    this.sources.delete(id);
  }
  getLayer(id: string) {
    return this.layers.get(id);
  }
  addLayer(spec: Record<string, unknown> & { id: string }, before?: string) {
    this.layers.set(spec.id, { spec, before, layout: { ...(spec.layout as object) }, paint: { ...(spec.paint as object) } });
  }
  removeLayer(id: string) {
    this.layers.delete(id);
  }
  setPaintProperty(id: string, key: string, value: unknown) {
    this.layers.get(id)!.paint[key] = value;
  }
  setLayoutProperty(id: string, key: string, value: unknown) {
    this.layers.get(id)!.layout[key] = value;
  }
  hasImage(id: string) {
    return this.images.has(id);
  }
  addImage(id: string, image: { width: number; height: number; data: Uint8ClampedArray }, options?: unknown) {
    if (this.images.has(id)) throw new Error(`An image named "${id}" already exists.`);
    this.images.set(id, { image, options });
  }
  /** Moves a layer to the top (no `before`), as MapLibre does. */
  moveLayer(id: string) {
    const layer = this.layers.get(id);
    if (!layer) throw new Error(`The layer "${id}" does not exist.`);
    this.layers.delete(id);
    this.layers.set(id, layer);
  }
  setFilter(id: string, filter: unknown) {
    this.layers.get(id)!.spec = { ...this.layers.get(id)!.spec, filter };
  }
  queryRenderedFeatures() {
    return this.featuresUnderPointer;
  }
  /** Screen position of a point: 1,000 px per degree from the top-left corner at -39°, 45° (enough to test overlap). */
  project([lng, lat]: [number, number]) {
    return { x: (lng + 39) * 1000, y: (45 - lat) * 1000 };
  }
  getCanvas() {
    return this.canvas;
  }
  fitBounds() {}
  triggerRepaint() {}
  jumpTo() {}
  getZoom() {
    return this.zoom;
  }
  getCenter() {
    return { lng: -38.5, lat: 44.5 };
  }
  getBearing() {
    return 0;
  }
  getPitch() {
    return 0;
  }
  remove() {
    this.removed = true;
  }
}

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

  constructor(style?: unknown) {
    // A style object's layers exist once it has loaded, as on the real map; a style URL brings none here.
    if (typeof style === 'object' && style && 'layers' in style) {
      for (const layer of (style as { layers: Array<Record<string, unknown> & { id: string }> }).layers) this.addLayer(layer);
    }
  }

  on(event: string, handler: (event?: unknown) => void) {
    this.handlers.set(event, [...(this.handlers.get(event) ?? []), handler]);
    return this;
  }
  once(event: string, handler: (event?: unknown) => void) {
    const wrapped = (payload?: unknown) => {
      this.off(event, wrapped);
      handler(payload);
    };
    return this.on(event, wrapped);
  }
  off(event: string, handler: (event?: unknown) => void) {
    this.handlers.set(event, (this.handlers.get(event) ?? []).filter((h) => h !== handler));
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

import { screen, waitFor, within } from '@testing-library/react';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { http, HttpResponse } from 'msw';
import { act } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import type { MapSite, MapSurface } from '../../types';
import { BasemapSiteMap } from '../basemap-site-map';
import { SurfaceMap } from '../surface-map';
import { FakeMap } from './fake-map';

const maps: FakeMap[] = [];
const labels: Array<{ text: string; lngLat: [number, number]; removed: boolean; element: HTMLElement }> = [];
vi.mock('../../lib/map-instance', () => ({
  mapInstanceCreate: vi.fn((_container: HTMLElement, style: unknown) => {
    const map = new FakeMap(style);
    maps.push(map);
    setTimeout(() => map.fire('load'), 0);
    return map;
  }),
  markerAdd: vi.fn(() => () => undefined),
  siteLabelAdd: vi.fn((element: HTMLElement, lngLat: [number, number]) => {
    const label = { text: element.textContent ?? '', lngLat, removed: false, element };
    labels.push(label);
    return { move: (next: [number, number]) => void (label.lngLat = next), remove: () => void (label.removed = true) };
  }),
  canvasFromRgba: vi.fn((_rgba: Uint8ClampedArray, width: number, height: number) => ({ width, height }) as HTMLCanvasElement),
}));

const basemap = readFileSync(join(dirname(fileURLToPath(import.meta.url)), '../../../../../public/basemap/quillport.geojson'), 'utf8');
const scope = { orgId: 'org_1', workspaceId: 'wsp_1' };
const base = '*/api/organizations/org_1/workspaces/wsp_1';

const sites: MapSite[] = [
  { id: 'site_1', name: 'Quay corner', kind: 'candidate', lon: -38.51, lat: 44.52 },
  { id: 'site_2', name: 'Harbour Row', kind: 'own', lon: -38.47, lat: 44.49 },
  { id: 'site_3', name: 'Crumbhall Mill Street', kind: 'competitor', lon: -38.45, lat: 44.55 },
  { id: 'site_4', name: 'Lantern Yard', kind: 'candidate', lon: -38.49, lat: 44.5, label: '#1' },
];

const surface: MapSurface = { id: 'srf_1', name: 'Harbour spend 2026', status: 'succeeded', customerFileId: 'cf_1', params: { unit: 'km2' }, thresholds: null };

function rasterResponse() {
  const values = new Float32Array(4 * 3).fill(2);
  return new HttpResponse(values.buffer, {
    headers: {
      'Content-Type': 'application/octet-stream',
      'X-Raster-Width': '4',
      'X-Raster-Height': '3',
      'X-Raster-Bounds': '-38.7,44.35,-38.3,44.65',
      'X-Raster-Unit': 'km2',
      'X-Raster-Max': '2',
    },
  });
}

beforeEach(() => {
  maps.length = 0;
  labels.length = 0;
  server.use(
    http.get('*/basemap/quillport.geojson', () => HttpResponse.text(basemap, { headers: { 'Content-Type': 'application/geo+json' } })),
    http.get(`${base}/surfaces/:id/web-raster`, () => rasterResponse()),
    http.get(`${base}/surfaces/:id/contours`, () => HttpResponse.json({ type: 'FeatureCollection', features: [] })),
  );
});

async function sitesLayer() {
  await waitFor(() => expect(maps.at(-1)?.layers.get('ds-sites')).toBeDefined());
  return maps.at(-1)!;
}

const at = (lon: number, lat: number) => ({ lngLat: { lng: lon, lat }, point: { x: 10, y: 10 }, preventDefault: vi.fn(), type: 'mousedown' });

describe('SurfaceMap with sites', () => {
  it('draws the sites from a GeoJSON source with one symbol image per kind, above the surface and contours', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} selectedSiteId="site_2" />);
    const map = await sitesLayer();
    await waitFor(() => expect(map.layers.get('ds-surface')).toBeDefined());
    expect([...map.images.keys()].sort()).toEqual(['ds-site-candidate', 'ds-site-competitor', 'ds-site-own']);
    expect(map.images.get('ds-site-own')?.options).toEqual({ pixelRatio: 2 });
    const source = map.sources.get('ds-sites') as { type: string; data: { features: Array<{ properties: { id: string; icon: string } }> } };
    expect(source.type).toBe('geojson');
    expect(source.data.features.map((f) => f.properties.icon)).toEqual(['ds-site-candidate', 'ds-site-own', 'ds-site-competitor', 'ds-site-candidate']);
    expect(map.layers.get('ds-sites')?.layout['icon-image']).toEqual(['get', 'icon']);
    expect(map.layers.get('ds-sites-selected')?.spec.filter).toEqual(['==', ['get', 'id'], 'site_2']);
    // The sites are the last layers, so nothing added later hides them.
    await waitFor(() => expect([...map.layers.keys()].slice(-2)).toEqual(['ds-sites-selected', 'ds-sites']));
  });

  it('writes each site’s name, or its label such as a rank, beside the symbol', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} />);
    await sitesLayer();
    // In priority order: ranked, then candidates, own stores, competitors.
    await waitFor(() => expect(labels.filter((l) => !l.removed).map((l) => l.text)).toEqual(['#1', 'Quay corner', 'Harbour Row', 'Crumbhall Mill Street']));
  });

  it('hides a label that would print over a more important one, and shows it again when there is room', async () => {
    const crowded: MapSite[] = [
      { id: 'site_1', name: 'Quay corner', kind: 'candidate', lon: -38.51, lat: 44.52 },
      // 2 px to the right in the fake map's projection: the labels overlap.
      { id: 'site_5', name: 'Wharf kiosk', kind: 'competitor', lon: -38.508, lat: 44.52 },
    ];
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={crowded} />);
    const map = await sitesLayer();
    await waitFor(() => expect(labels.filter((l) => !l.removed)).toHaveLength(2));
    const [first, second] = labels.filter((l) => !l.removed);
    expect([first!.text, first!.element.style.visibility]).toEqual(['Quay corner', 'visible']);
    expect([second!.text, second!.element.style.visibility]).toEqual(['Wharf kiosk', 'hidden']);
    // Zoomed in (here: the projection spreads the points), the second label fits again.
    map.project = ([lng, lat]: [number, number]) => ({ x: (lng + 39) * 100_000, y: (45 - lat) * 100_000 });
    act(() => map.fire('moveend'));
    expect(second!.element.style.visibility).toBe('visible');
  });

  it('shows a legend row per kind with its symbol and count', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="executive" sites={sites} />);
    const legend = await screen.findByRole('list', { name: 'Site symbols' });
    const rows = within(legend).getAllByRole('listitem').map((li) => li.textContent);
    expect(rows).toEqual(['Candidate site(2)', 'Own store(1)', 'Competitor store(1)']);
    const shapes = within(legend)
      .getAllByRole('listitem')
      .map((li) => li.querySelector('svg')?.getAttribute('data-shape'));
    expect(shapes).toEqual(['diamond', 'square', 'triangle']);
  });

  it('selects a site on click', async () => {
    const onSiteSelect = vi.fn();
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} onSiteSelect={onSiteSelect} />);
    const map = await sitesLayer();
    act(() => map.fire('click:ds-sites', { ...at(-38.47, 44.49), features: [{ properties: { id: 'site_2' } }] }));
    expect(onSiteSelect).toHaveBeenCalledWith('site_2');
  });

  it('moves a site by dragging it: press, move, release gives one call with the new position', async () => {
    const onSiteMove = vi.fn();
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} onSiteMove={onSiteMove} />);
    const map = await sitesLayer();
    act(() => map.fire('mouseenter:ds-sites'));
    expect(map.canvas.style.cursor).toBe('move');
    const press = { ...at(-38.51, 44.52), features: [{ properties: { id: 'site_1' } }] };
    act(() => map.fire('mousedown:ds-sites', press));
    expect(press.preventDefault).toHaveBeenCalled(); // the map does not pan meanwhile
    act(() => map.fire('mousemove', at(-38.505, 44.521)));
    act(() => map.fire('mousemove', at(-38.5, 44.53)));
    // The symbol and its label follow the pointer before the release.
    const drawn = map.sources.get('ds-sites') as { data: { features: Array<{ properties: { id: string }; geometry: { coordinates: number[] } }> } };
    expect(drawn.data.features.find((f) => f.properties.id === 'site_1')?.geometry.coordinates).toEqual([-38.5, 44.53]);
    expect(labels.find((l) => l.text === 'Quay corner' && !l.removed)?.lngLat).toEqual([-38.5, 44.53]);
    expect(onSiteMove).not.toHaveBeenCalled();
    act(() => map.fire('mouseup', at(-38.5, 44.53)));
    expect(onSiteMove).toHaveBeenCalledTimes(1);
    expect(onSiteMove).toHaveBeenCalledWith('site_1', { lon: -38.5, lat: 44.53 });
    act(() => map.fire('mousemove', at(-38.4, 44.6)));
    expect(onSiteMove).toHaveBeenCalledTimes(1);
  });

  it('moves a site with one finger too, and leaves two-finger gestures to the map', async () => {
    const onSiteMove = vi.fn();
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} onSiteMove={onSiteMove} />);
    const map = await sitesLayer();
    const pinch = { ...at(-38.47, 44.49), type: 'touchstart', points: [{}, {}], features: [{ properties: { id: 'site_2' } }] };
    act(() => map.fire('touchstart:ds-sites', pinch));
    expect(pinch.preventDefault).not.toHaveBeenCalled();
    const touch = { ...at(-38.47, 44.49), type: 'touchstart', points: [{}], features: [{ properties: { id: 'site_2' } }] };
    act(() => map.fire('touchstart:ds-sites', touch));
    expect(touch.preventDefault).toHaveBeenCalled();
    act(() => map.fire('touchmove', at(-38.46, 44.495)));
    act(() => map.fire('touchend', at(-38.46, 44.495)));
    expect(onSiteMove).toHaveBeenCalledWith('site_2', { lon: -38.46, lat: 44.495 });
  });

  it('does not drag without onSiteMove (the map pans as usual)', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="analyst" sites={sites} />);
    const map = await sitesLayer();
    const press = { ...at(-38.51, 44.52), features: [{ properties: { id: 'site_1' } }] };
    act(() => map.fire('mousedown:ds-sites', press));
    expect(press.preventDefault).not.toHaveBeenCalled();
    act(() => map.fire('mouseenter:ds-sites'));
    expect(map.canvas.style.cursor).toBe('pointer');
  });

  it('in the add mode, reports a click on empty map with a crosshair cursor and a hint, but not a click on a site', async () => {
    const onMapClickAdd = vi.fn();
    renderWithProviders(<SurfaceMap scope={scope} surface={surface} customerFile={null} role="planner" sites={sites} onMapClickAdd={onMapClickAdd} />);
    const map = await sitesLayer();
    expect(screen.getByText('Click the map where the new site goes.')).toBeInTheDocument();
    await waitFor(() => expect(map.canvas.style.cursor).toBe('crosshair'));
    act(() => map.fire('click', at(-38.48, 44.51)));
    expect(onMapClickAdd).toHaveBeenCalledWith({ lon: -38.48, lat: 44.51 });
    map.featuresUnderPointer = [{ properties: { id: 'site_1' } }];
    act(() => map.fire('click', at(-38.51, 44.52)));
    expect(onMapClickAdd).toHaveBeenCalledTimes(1);
  });

  it('BasemapSiteMap draws the basemap with the sites when there is no surface yet', async () => {
    renderWithProviders(<BasemapSiteMap note="No demand surface yet: the sites are shown on the basemap alone." sites={sites} />);
    const map = await sitesLayer();
    expect(screen.getByText('No demand surface yet: the sites are shown on the basemap alone.')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Map of the study’s sites' })).toBeInTheDocument();
    expect(map.layers.get('ds-surface')).toBeUndefined();
    expect(map.layers.get('basemap-land')).toBeDefined();
    expect(screen.getByRole('list', { name: 'Site symbols' })).toBeInTheDocument();
  });
});

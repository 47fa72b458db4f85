import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { http, HttpResponse } from 'msw';
import { act } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import type { MapCustomerFile, MapSurface } from '../../types';
import { rasterPixelCentre, type RasterBounds } from '../../utils/web-raster';
import { SurfaceMap } from '../surface-map';
import { FakeMap } from './fake-map';

const maps: FakeMap[] = [];
vi.mock('../../lib/map-instance', () => ({
  mapInstanceCreate: vi.fn((_container: HTMLElement, style: unknown) => {
    const map = new FakeMap(style);
    maps.push(map);
    // MapLibre fires `load` after the style is parsed, never synchronously.
    setTimeout(() => map.fire('load'), 0);
    return map;
  }),
  markerAdd: vi.fn(() => () => undefined),
  canvasFromRgba: vi.fn((_rgba: Uint8ClampedArray, width: number, height: number) => ({ width, height }) as HTMLCanvasElement),
}));

const basemap = readFileSync(join(dirname(fileURLToPath(import.meta.url)), '../../../../../public/basemap/quillport.geojson'), 'utf8');
const scope = { orgId: 'org_1', workspaceId: 'wsp_1' };
const base = '*/api/organizations/org_1/workspaces/wsp_1';
const BOUNDS: RasterBounds = [-38.7, 44.35, -38.3, 44.65];
const SIZE = { width: 40, height: 30 };
const HOT = { col: 12, row: 9, value: 436.5 };

function createMapSurface(overrides: Partial<MapSurface> = {}): MapSurface {
  return {
    id: 'srf_1',
    name: 'Harbour spend 2026',
    status: 'succeeded',
    customerFileId: 'cf_1',
    params: { unit: 'km2' },
    thresholds: [
      { percent: 50, threshold: 120, areaKm2: 12.4, clipped: false },
      { percent: 75, threshold: 60, areaKm2: 31, clipped: false },
      { percent: 90, threshold: 20, areaKm2: 58.2, clipped: true },
    ],
    ...overrides,
  };
}

const countFile: MapCustomerFile = { id: 'cf_1', name: 'loyalty-2026.csv', weightKind: 'count', weightLabel: null };

function rasterResponse(fill: number, unit = 'km2') {
  const values = new Float32Array(SIZE.width * SIZE.height).fill(fill);
  values[0] = Number.NaN;
  values[HOT.col + HOT.row * SIZE.width] = HOT.value;
  return new HttpResponse(values.buffer, {
    headers: {
      'Content-Type': 'application/octet-stream',
      'X-Raster-Width': String(SIZE.width),
      'X-Raster-Height': String(SIZE.height),
      'X-Raster-Bounds': BOUNDS.join(','),
      'X-Raster-Unit': unit,
      'X-Raster-Max': String(Math.max(HOT.value, fill)),
    },
  });
}

beforeEach(() => {
  maps.length = 0;
  server.use(
    http.get('*/basemap/quillport.geojson', () => HttpResponse.text(basemap, { headers: { 'Content-Type': 'application/geo+json' } })),
    http.get(`${base}/surfaces/:id/web-raster`, () => rasterResponse(3)),
    http.get(`${base}/surfaces/:id/contours`, () =>
      HttpResponse.json({
        type: 'FeatureCollection',
        features: [50, 75, 90].map((percent) => ({
          type: 'Feature',
          properties: { percent, threshold: 10, unit: 'km2' },
          geometry: { type: 'LineString', coordinates: [[-38.5, 44.5], [-38.45, 44.52]] },
        })),
      }),
    ),
  );
});

async function loadedMap() {
  await waitFor(() => expect(maps.at(-1)?.layers.get('ds-surface')).toBeDefined());
  return maps.at(-1)!;
}

describe('SurfaceMap', () => {
  it('shows the legend in the surface’s unit with contour areas and the caution', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface()} customerFile={countFile} role="executive" />);
    expect(await screen.findByText('(customers per km²)')).toBeInTheDocument();
    expect(screen.getByText('400')).toBeInTheDocument();
    expect(screen.getByLabelText(/50 % of demand within/)).toBeChecked();
    expect(screen.getByText('12.4 km²')).toBeInTheDocument();
    expect(screen.getByText(/not a forecast of sales; check leases, zoning and local rules with licensed professionals/)).toBeInTheDocument();
  });

  it('words spend per square mile when the surface is in sq mi', async () => {
    server.use(http.get(`${base}/surfaces/:id/web-raster`, () => rasterResponse(3, 'sqmi')));
    renderWithProviders(
      <SurfaceMap
        scope={scope}
        surface={createMapSurface({ params: { unit: 'sqmi' } })}
        customerFile={{ ...countFile, weightKind: 'spend', weightLabel: null }}
        role="analyst"
      />,
    );
    expect(await screen.findByText('(spend per sq mi)')).toBeInTheDocument();
    expect(screen.getByText('4.79 sq mi')).toBeInTheDocument(); // 12.4 km² / 2.589988 km² per sq mi
  });

  it('words the legend from the weight prop when there is no customer file, and never asks for customers', async () => {
    let aggregateCalls = 0;
    server.use(
      http.get(`${base}/customer-files/:id/aggregate`, () => {
        aggregateCalls += 1;
        return HttpResponse.json({ error: { code: 'FORBIDDEN', message: 'Not for executives.' } }, { status: 403 });
      }),
    );
    renderWithProviders(
      <SurfaceMap scope={scope} surface={createMapSurface()} customerFile={null} weight={{ kind: 'other', label: 'annual spend (€)' }} role="executive" />,
    );
    expect(await screen.findByText('(annual spend (€) per km²)')).toBeInTheDocument();
    expect(screen.queryByText(/customers per km²/)).not.toBeInTheDocument();
    const map = await loadedMap();
    const hot = rasterPixelCentre({ ...SIZE, bounds: BOUNDS }, HOT.col, HOT.row);
    act(() => map.fire('mousemove', { lngLat: { lng: hot.lon, lat: hot.lat } }));
    expect(await screen.findByText('437 annual spend (€) per km²')).toBeInTheDocument();
    expect(screen.queryByLabelText(/Show customers/)).not.toBeInTheDocument();
    expect(map.layers.get('ds-customers')).toBeUndefined();
    expect(aggregateCalls).toBe(0);
  });

  it('places the coloured raster at the server’s bounds and draws the contours under the switches', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface()} customerFile={countFile} role="planner" />);
    const map = await loadedMap();
    expect(map.sources.get('ds-surface')).toEqual({
      type: 'canvas',
      canvas: { width: SIZE.width, height: SIZE.height },
      animate: false,
      coordinates: [
        [-38.7, 44.65],
        [-38.3, 44.65],
        [-38.3, 44.35],
        [-38.7, 44.35],
      ],
    });
    expect(map.layers.get('ds-surface')?.before).toBe('basemap-river');
    await waitFor(() => expect(map.layers.get('ds-contours-75')?.layout.visibility).toBe('visible'));
    await userEvent.click(screen.getByLabelText(/75 % of demand within/));
    expect(map.layers.get('ds-contours-75')?.layout.visibility).toBe('none');
    fireEvent.change(screen.getByLabelText(/Surface opacity/), { target: { value: '0.45' } });
    expect(map.layers.get('ds-surface')?.paint['raster-opacity']).toBe(0.45);
  });

  it('reads the value under the cursor from the raster and says when it is outside', async () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface()} customerFile={countFile} role="executive" />);
    const map = await loadedMap();
    const hot = rasterPixelCentre({ ...SIZE, bounds: BOUNDS }, HOT.col, HOT.row);
    act(() => map.fire('mousemove', { lngLat: { lng: hot.lon, lat: hot.lat } }));
    expect(await screen.findByText('437 customers per km²')).toBeInTheDocument();
    const corner = rasterPixelCentre({ ...SIZE, bounds: BOUNDS }, 0, 0);
    act(() => map.fire('mousemove', { lngLat: { lng: corner.lon, lat: corner.lat } }));
    expect(await screen.findByText('Outside the surface.')).toBeInTheDocument();
    act(() => map.fire('mousemove', { lngLat: { lng: -39.5, lat: 44.5 } }));
    expect(await screen.findByText('Outside the surface.')).toBeInTheDocument();
  });

  it('offers aggregated customers to analysts only, as suppressed squares', async () => {
    let aggregateCalls = 0;
    server.use(
      http.get(`${base}/customer-files/cf_1/aggregate`, ({ request }) => {
        aggregateCalls += 1;
        expect(new URL(request.url).searchParams.get('zoom')).toBe('11');
        return HttpResponse.json({
          type: 'FeatureCollection',
          binSizeM: 500,
          minCount: 11,
          suppressed: { bins: 4, customers: 23, weight: 3100 },
          features: [
            {
              type: 'Feature',
              properties: { count: 42, weight: 7000 },
              geometry: { type: 'Polygon', coordinates: [[[-38.5, 44.5], [-38.49, 44.5], [-38.49, 44.51], [-38.5, 44.51], [-38.5, 44.5]]] },
            },
          ],
        });
      }),
    );
    const { unmount } = renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface()} customerFile={countFile} role="executive" />);
    await loadedMap();
    expect(screen.queryByLabelText(/Show customers/)).not.toBeInTheDocument();
    unmount();
    maps.length = 0;

    renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface()} customerFile={countFile} role="analyst" />);
    const map = await loadedMap();
    await userEvent.click(screen.getByLabelText(/Show customers/));
    expect(await screen.findByText('(customers per 500 m square)')).toBeInTheDocument();
    expect(screen.getByText(/fewer than 11 customers are hidden \(23 customers in them\)/)).toBeInTheDocument();
    await waitFor(() => expect(map.layers.get('ds-customers')).toBeDefined());
    expect(aggregateCalls).toBe(1);
  });

  it('compares with a second surface as a difference on a diverging scale', async () => {
    let differencePath = '';
    server.use(
      http.get(`${base}/surfaces/:id/difference/:other/web-raster`, ({ request }) => {
        differencePath = new URL(request.url).pathname;
        return rasterResponse(-20);
      }),
    );
    const other = createMapSurface({ id: 'srf_2', name: 'Visits 2026' });
    renderWithProviders(
      <SurfaceMap
        scope={scope}
        surface={createMapSurface()}
        customerFile={countFile}
        role="planner"
        compareCandidates={[createMapSurface(), other, createMapSurface({ id: 'srf_3', name: 'Still running', status: 'running' })]}
      />,
    );
    await loadedMap();
    const select = screen.getByLabelText('Compare with');
    expect([...(select as HTMLSelectElement).options].map((o) => o.text)).toEqual(['No comparison', 'Visits 2026']);
    await userEvent.selectOptions(select, 'srf_2');
    expect(await screen.findByText('Difference: Visits 2026 minus this one')).toBeInTheDocument();
    expect(differencePath).toBe('/api/organizations/org_1/workspaces/wsp_1/surfaces/srf_1/difference/srf_2/web-raster');
    expect(screen.getByText('+400')).toBeInTheDocument();
  });

  it('says so instead of drawing when the surface has not succeeded', () => {
    renderWithProviders(<SurfaceMap scope={scope} surface={createMapSurface({ status: 'running' })} customerFile={countFile} role="analyst" />);
    expect(screen.getByText('“Harbour spend 2026” is running')).toBeInTheDocument();
    expect(maps).toHaveLength(0);
  });
});

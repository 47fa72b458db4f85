import { projectionConverter, projectionForLonLat, type LocalProjection } from '@demandscape/core';
import { AppError } from '../common/errors.js';
import type { CustomerPoints } from './customer-points.js';

/** Bins with fewer customers are left out (CMS cell-size suppression rule: no cells of 1–10 [S]). */
export const AGGREGATE_MIN_COUNT = 11;
/** Smallest bin side in metres. */
export const AGGREGATE_MIN_SIDE_M = 250;
/** Bin sides offered, metres (the smallest one at least as large as the target is used). */
export const AGGREGATE_SIDES_M = [
  250, 500, 1000, 2000, 5000, 10_000, 20_000, 50_000, 100_000, 200_000, 500_000,
] as const;
/** Target bin size on screen, pixels. */
const TARGET_PIXELS = 24;
/** Web Mercator ground resolution at the equator for zoom 0 with 256-px tiles, metres per pixel (2π·6378137/256 [S]). */
const MERCATOR_M_PER_PX_Z0 = (2 * Math.PI * 6_378_137) / 256;

/** Aggregated customers: square bins in a local metric projection, small bins suppressed. */
export interface CustomerAggregate {
  type: 'FeatureCollection';
  features: {
    type: 'Feature';
    geometry: { type: 'Polygon'; coordinates: [number, number][][] };
    properties: { count: number; weight: number };
  }[];
  binSizeM: number;
  projection: string;
  minCount: number;
  suppressed: { bins: number; customers: number; weight: number };
}

/**
 * Bin side for a map zoom: about 24 screen pixels at the data's latitude, rounded up to one of
 * AGGREGATE_SIDES_M (never below 250 m).
 * @param zoom - Web Mercator zoom level (0–22)
 * @param latitude - degrees, where the data is
 * @returns metres
 * @example
 * aggregateSide(12, 50); // 1000 (24 px ≈ 590 m at zoom 12, latitude 50°)
 */
export function aggregateSide(zoom: number, latitude: number): number {
  const target =
    (TARGET_PIXELS * MERCATOR_M_PER_PX_Z0 * Math.cos((latitude * Math.PI) / 180)) / 2 ** zoom;
  return (
    AGGREGATE_SIDES_M.find((s) => s >= target) ?? AGGREGATE_SIDES_M[AGGREGATE_SIDES_M.length - 1]
  );
}

/**
 * Counts customers and sums their weight in square bins of a local metric projection (UTM of the
 * data, or a data-centred equal-area projection when the data is too wide), and drops every bin
 * with fewer than 11 customers — so no single customer's location can be read off the result.
 * @param points - the file's stored points
 * @param zoom - map zoom (decides the bin side)
 * @returns a GeoJSON FeatureCollection in lon/lat with `{ count, weight }` per bin, plus what was suppressed
 * @throws AppError 400 NO_POINTS / 400 PROJECTION_SPAN
 * @example
 * const fc = customerAggregate(await customerPointsLoad(em, id), 13);
 */
export function customerAggregate(points: CustomerPoints, zoom: number): CustomerAggregate {
  if (points.count === 0)
    throw new AppError(
      400,
      'NO_POINTS',
      'This customer file has no imported points to aggregate. Import it first.',
    );
  const projection = projectionFor(points);
  const conv = projectionConverter(projection);
  const side = Math.max(AGGREGATE_MIN_SIDE_M, aggregateSide(zoom, projection.centerLat));
  const { x, y } = conv.forward(points.lon, points.lat);
  const bins = new Map<string, { ix: number; iy: number; count: number; weight: number }>();
  for (let i = 0; i < points.count; i++) {
    const ix = Math.floor(x[i] / side);
    const iy = Math.floor(y[i] / side);
    const key = `${ix},${iy}`;
    const bin = bins.get(key);
    if (bin) {
      bin.count++;
      bin.weight += points.w[i];
    } else bins.set(key, { ix, iy, count: 1, weight: points.w[i] });
  }
  const features: CustomerAggregate['features'] = [];
  const suppressed = { bins: 0, customers: 0, weight: 0 };
  for (const bin of [...bins.values()].sort((a, b) => a.iy - b.iy || a.ix - b.ix)) {
    if (bin.count < AGGREGATE_MIN_COUNT) {
      suppressed.bins++;
      suppressed.customers += bin.count;
      suppressed.weight += bin.weight;
      continue;
    }
    const x0 = bin.ix * side;
    const y0 = bin.iy * side;
    // Exterior ring counter-clockwise (RFC 7946 §3.1.6).
    const ring = [
      conv.inversePoint(x0, y0),
      conv.inversePoint(x0 + side, y0),
      conv.inversePoint(x0 + side, y0 + side),
      conv.inversePoint(x0, y0 + side),
    ];
    ring.push(ring[0]);
    features.push({
      type: 'Feature',
      geometry: { type: 'Polygon', coordinates: [ring] },
      properties: { count: bin.count, weight: bin.weight },
    });
  }
  return {
    type: 'FeatureCollection',
    features,
    binSizeM: side,
    projection: projection.label,
    minCount: AGGREGATE_MIN_COUNT,
    suppressed,
  };
}

function projectionFor(points: CustomerPoints): LocalProjection {
  try {
    return projectionForLonLat(points.lon, points.lat);
  } catch {
    try {
      return projectionForLonLat(points.lon, points.lat, { projection: 'laea' });
    } catch (err) {
      throw new AppError(
        400,
        'PROJECTION_SPAN',
        `The customers spread too wide to bin on one local map projection: ${(err as Error).message}.`,
      );
    }
  }
}

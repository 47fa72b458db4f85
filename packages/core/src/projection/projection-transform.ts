import proj4 from 'proj4';
import type { LocalProjection } from './projection-for-lon-lat.js';

/** Forward and inverse transforms of one local projection, built once and reused. */
export interface ProjectionConverter {
  /** lon/lat degrees → planar metres, element-wise. */
  forward(lon: Float64Array, lat: Float64Array): { x: Float64Array; y: Float64Array };
  /** planar metres → lon/lat degrees, element-wise. */
  inverse(x: Float64Array, y: Float64Array): { lon: Float64Array; lat: Float64Array };
  /** One planar point → [lon, lat] (GeoJSON order). */
  inversePoint(x: number, y: number): [number, number];
  /** One lon/lat point → [x, y] metres. */
  forwardPoint(lon: number, lat: number): [number, number];
}

const WGS84 = 'EPSG:4326';

/**
 * Builds the proj4 converter for a local projection once, for fast array transforms.
 * proj4's ellipsoidal LAEA inverse goes through a truncated series for the authalic latitude
 * (errors of a few mm); one Newton step against the forward transform brings the round trip
 * below 1 µm.
 *
 * @param projection from `projectionForLonLat`
 * @returns forward/inverse functions over typed arrays and single points
 * @example
 * const c = projectionConverter(projectionForLonLat(lon, lat));
 * const { x, y } = c.forward(lon, lat);
 */
export function projectionConverter(projection: LocalProjection): ProjectionConverter {
  const conv = proj4(WGS84, projection.proj4);
  const forwardPoint = (lon: number, lat: number): [number, number] => {
    const p = conv.forward([lon, lat]);
    return [p[0], p[1]];
  };
  const refine = projection.kind === 'laea';
  const inversePoint = (x: number, y: number): [number, number] => {
    const p = conv.inverse([x, y]);
    let lon = p[0];
    let lat = p[1];
    if (refine) [lon, lat] = newtonStep(forwardPoint, x, y, lon, lat);
    return [lon, lat];
  };
  return {
    forwardPoint,
    inversePoint,
    forward(lon, lat) {
      const n = lon.length;
      const x = new Float64Array(n);
      const y = new Float64Array(n);
      const buf: [number, number] = [0, 0];
      for (let i = 0; i < n; i++) {
        buf[0] = lon[i];
        buf[1] = lat[i];
        const p = conv.forward(buf);
        x[i] = p[0];
        y[i] = p[1];
      }
      return { x, y };
    },
    inverse(x, y) {
      const n = x.length;
      const lon = new Float64Array(n);
      const lat = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        const p = inversePoint(x[i], y[i]);
        lon[i] = p[0];
        lat[i] = p[1];
      }
      return { lon, lat };
    },
  };
}

/** One Newton step on forward(lon, lat) = (x, y) with a finite-difference Jacobian. */
function newtonStep(
  forward: (lon: number, lat: number) => [number, number],
  x: number,
  y: number,
  lon: number,
  lat: number,
): [number, number] {
  // 1e-6° ≈ 0.1 m: small enough for a linear model, large enough to avoid cancellation.
  const e = 1e-6;
  const f = forward(lon, lat);
  const fl = forward(lon + e, lat);
  const fp = forward(lon, lat + e);
  const a = (fl[0] - f[0]) / e;
  const b = (fp[0] - f[0]) / e;
  const c = (fl[1] - f[1]) / e;
  const d = (fp[1] - f[1]) / e;
  const det = a * d - b * c;
  if (!Number.isFinite(det) || det === 0) return [lon, lat];
  const rx = x - f[0];
  const ry = y - f[1];
  return [lon + (d * rx - b * ry) / det, lat + (a * ry - c * rx) / det];
}

import { CoreError } from '../errors.js';
import { formatNumber } from '../lib/format-number.js';

/** Validated customer points in WGS84 degrees with a weight each (structure of arrays). */
export interface LonLatPoints {
  lon: Float64Array;
  lat: Float64Array;
  w: Float64Array;
}

type NumericArray = ArrayLike<number>;

/**
 * Validates customer points at the engine's edge and copies them into typed arrays. Weights
 * default to 1 (a count of customers). Rows are numbered from 0 in messages and `details.index`.
 *
 * @param lon longitudes, degrees east, within ±180
 * @param lat latitudes, degrees north, within ±90
 * @param weight optional weights ≥ 0 (annual spend, visits…); at least one must be > 0
 * @returns the validated points
 * @throws CoreError EMPTY_POINTS, INVALID_COORDINATE, COORDINATE_OUT_OF_RANGE, INVALID_WEIGHT, ZERO_TOTAL_WEIGHT
 * @example
 * const pts = pointsFromLonLat([-31.8, -31.7], [-38.0, -37.9], [120, 80]);
 */
export function pointsFromLonLat(lon: NumericArray, lat: NumericArray, weight?: NumericArray): LonLatPoints {
  const n = lon.length;
  if (n === 0) {
    throw new CoreError('EMPTY_POINTS', 'there are no customer points; upload a file with at least one located customer', 'lon');
  }
  if (lat.length !== n) {
    throw new CoreError('INVALID_ARGUMENT', `lon and lat must have the same length (got ${n} and ${lat.length})`, 'lat');
  }
  if (weight && weight.length !== n) {
    throw new CoreError('INVALID_ARGUMENT', `weight must have one value per point (got ${weight.length} for ${n} points)`, 'weight');
  }
  const out: LonLatPoints = { lon: new Float64Array(n), lat: new Float64Array(n), w: new Float64Array(n) };
  let total = 0;
  for (let i = 0; i < n; i++) {
    const x = lon[i];
    const y = lat[i];
    if (typeof x !== 'number' || !Number.isFinite(x) || typeof y !== 'number' || !Number.isFinite(y)) {
      const field = typeof x !== 'number' || !Number.isFinite(x) ? 'lon' : 'lat';
      throw new CoreError(
        'INVALID_COORDINATE',
        `point ${i}: ${field} must be a finite number of degrees (got ${String(field === 'lon' ? x : y)}); fix or remove the row`,
        field,
        { index: i, value: field === 'lon' ? x : y },
      );
    }
    if (Math.abs(y) > 90) {
      const swapped = Math.abs(x) <= 90;
      throw new CoreError(
        'COORDINATE_OUT_OF_RANGE',
        `point ${i}: latitude ${formatNumber(y, 6)} is outside -90..90` +
          (swapped ? '; the latitude and longitude columns look swapped — map them the other way round' : '; check the column mapping'),
        'lat',
        { index: i, value: y },
      );
    }
    if (Math.abs(x) > 180) {
      throw new CoreError(
        'COORDINATE_OUT_OF_RANGE',
        `point ${i}: longitude ${formatNumber(x, 6)} is outside -180..180; check the column mapping and that coordinates are in degrees (not projected metres)`,
        'lon',
        { index: i, value: x },
      );
    }
    const w = weight ? weight[i] : 1;
    if (typeof w !== 'number' || !Number.isFinite(w) || w < 0) {
      throw new CoreError(
        'INVALID_WEIGHT',
        `point ${i}: weight must be a finite number ≥ 0 (got ${String(w)}); fix the value or drop the weight column to count customers`,
        'weight',
        { index: i, value: w },
      );
    }
    out.lon[i] = x;
    out.lat[i] = y;
    out.w[i] = w;
    total += w;
  }
  if (!(total > 0)) {
    throw new CoreError(
      'ZERO_TOTAL_WEIGHT',
      `all ${formatNumber(n)} weights are zero, so there is no demand to spread; choose another weight column or count customers`,
      'weight',
    );
  }
  return out;
}

/**
 * The extent of lon/lat data on the sphere of longitudes: data that crosses the antimeridian
 * (e.g. 179°E to 179°W) is measured across it (span 2°, not 358°).
 */
export interface LonLatSpan {
  /** Western and eastern edges; `east` may exceed 180 when the data crosses the antimeridian. */
  west: number;
  east: number;
  /** east − west, degrees of longitude. */
  lonSpan: number;
  /** Mean longitude in [-180, 180), measured on the unwrapped values. */
  meanLon: number;
  south: number;
  north: number;
  meanLat: number;
  /** True when the shortest description of the data crosses ±180°. */
  crossesAntimeridian: boolean;
}

/**
 * Computes the span of lon/lat data, unwrapping longitudes across the antimeridian when that gives
 * the narrower extent. Inputs must be finite and in range (see `pointsFromLonLat`).
 *
 * @param lon longitudes, degrees
 * @param lat latitudes, degrees
 * @returns the span and the means
 * @example
 * lonLatSpan(Float64Array.of(179, -179), Float64Array.of(0, 1)); // lonSpan 2, crossesAntimeridian true
 */
export function lonLatSpan(lon: Float64Array, lat: Float64Array): LonLatSpan {
  const n = lon.length;
  // Extent in [-180, 180] and in [0, 360); whichever is narrower is the data's real extent.
  let minA = Infinity;
  let maxA = -Infinity;
  let minB = Infinity;
  let maxB = -Infinity;
  let sumA = 0;
  let sumB = 0;
  let south = Infinity;
  let north = -Infinity;
  let sumLat = 0;
  for (let i = 0; i < n; i++) {
    const a = lon[i];
    const b = a < 0 ? a + 360 : a;
    if (a < minA) minA = a;
    if (a > maxA) maxA = a;
    if (b < minB) minB = b;
    if (b > maxB) maxB = b;
    sumA += a;
    sumB += b;
    const p = lat[i];
    if (p < south) south = p;
    if (p > north) north = p;
    sumLat += p;
  }
  const crosses = maxB - minB < maxA - minA;
  const west = crosses ? minB : minA;
  const east = crosses ? maxB : maxA;
  let meanLon = (crosses ? sumB : sumA) / n;
  if (meanLon >= 180) meanLon -= 360;
  return {
    west: west > 180 ? west - 360 : west,
    east: west > 180 ? east - 360 : east,
    lonSpan: east - west,
    meanLon,
    south,
    north,
    meanLat: sumLat / n,
    crossesAntimeridian: crosses && east > 180 && west < 180,
  };
}

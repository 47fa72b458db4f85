/** Mean Earth radius in metres (IUGG, R₁ = 6,371,008.8 m [S]). */
export const EARTH_RADIUS_M = 6_371_008.8;
/** A point is an outlier beyond this many times the median distance to the centre [CP]. */
export const OUTLIER_MULTIPLE = 5;
/** Never flag points closer to the centre than this, in metres (one small town) [CP]. */
export const OUTLIER_MIN_LIMIT_M = 1000;
/** Below this many points the spread is too uncertain to flag anything [CP]. */
export const OUTLIER_MIN_POINTS = 20;

/** The outlier rule as applied to one file. */
export interface OutlierResult {
  centerLon: number;
  centerLat: number;
  /** Median great-circle distance of the points from the centre, metres. */
  spreadM: number;
  /** max(OUTLIER_MULTIPLE × spreadM, OUTLIER_MIN_LIMIT_M). */
  limitM: number;
  applied: boolean;
  /** 1 for each outlier point. */
  outlier: Uint8Array;
  count: number;
}

/**
 * Great-circle distance (haversine) in metres on a sphere of radius EARTH_RADIUS_M.
 * @param lon1 - degrees
 * @param lat1 - degrees
 * @param lon2 - degrees
 * @param lat2 - degrees
 * @returns metres
 * @example
 * haversineM(0, 0, 1, 0); // ≈ 111,195 m
 */
export function haversineM(lon1: number, lat1: number, lon2: number, lat2: number): number {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const a =
    Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_M * Math.asin(Math.min(1, Math.sqrt(a)));
}

/**
 * Weighted median: the smallest value at which the cumulative weight reaches half the total
 * (unweighted when all weights are zero).
 * @param values - the values
 * @param weights - non-negative weights, same length
 * @returns the weighted median (NaN for no values)
 * @example
 * weightedMedian(Float64Array.of(1, 2, 3), Float64Array.of(1, 1, 5)); // 3
 */
export function weightedMedian(values: Float64Array, weights: Float64Array): number {
  const n = values.length;
  if (n === 0) return NaN;
  // Native sort of the values, then a binary search for the smallest sorted value whose
  // cumulative weight (all values ≤ it) reaches half: O(n log n) with no comparator calls.
  const sorted = Float64Array.from(values).sort();
  let total = 0;
  for (let i = 0; i < n; i++) total += weights[i];
  const useWeights = total > 0;
  const half = (useWeights ? total : n) / 2;
  const weightUpTo = (limit: number) => {
    let acc = 0;
    for (let i = 0; i < n; i++) if (values[i] <= limit) acc += useWeights ? weights[i] : 1;
    return acc;
  };
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (weightUpTo(sorted[mid]) >= half) hi = mid;
    else lo = mid + 1;
  }
  return sorted[lo];
}

/**
 * Flags points far outside the main cloud. Centre: the weighted median longitude and latitude
 * (each axis on its own). Spread: the median great-circle distance of the points from that centre —
 * the median absolute deviation of the positions, in metres. A point is an outlier when its
 * distance exceeds max(5 × spread, 1 km). For a round Gaussian cloud of sd σ the distances follow a
 * Rayleigh law with median σ√(2 ln 2) ≈ 1.177σ, so the limit is ≈ 5.9σ and an ordinary point
 * crosses it with probability exp(−5.9²/2) ≈ 3·10⁻⁸ [D]. Fewer than 20 points: nothing is flagged.
 * @param lon - degrees
 * @param lat - degrees
 * @param w - weights
 * @param count - number of points to use from the arrays
 * @returns centre, spread, limit and one flag byte per point
 * @example
 * const { outlier, limitM } = outlierFlag(lon, lat, w, n);
 */
export function outlierFlag(
  lon: Float64Array,
  lat: Float64Array,
  w: Float64Array,
  count: number,
): OutlierResult {
  const outlier = new Uint8Array(count);
  const lonV = lon.subarray(0, count);
  const latV = lat.subarray(0, count);
  const wV = w.subarray(0, count);
  const centerLon = weightedMedian(lonV, wV);
  const centerLat = weightedMedian(latV, wV);
  if (count < OUTLIER_MIN_POINTS) {
    return { centerLon, centerLat, spreadM: NaN, limitM: NaN, applied: false, outlier, count: 0 };
  }
  const dist = new Float64Array(count);
  for (let i = 0; i < count; i++) dist[i] = haversineM(centerLon, centerLat, lonV[i], latV[i]);
  const sorted = Float64Array.from(dist).sort();
  const spreadM =
    count % 2 === 1 ? sorted[(count - 1) / 2] : (sorted[count / 2 - 1] + sorted[count / 2]) / 2;
  const limitM = Math.max(OUTLIER_MULTIPLE * spreadM, OUTLIER_MIN_LIMIT_M);
  let flagged = 0;
  for (let i = 0; i < count; i++) {
    if (dist[i] > limitM) {
      outlier[i] = 1;
      flagged++;
    }
  }
  return { centerLon, centerLat, spreadM, limitM, applied: true, outlier, count: flagged };
}

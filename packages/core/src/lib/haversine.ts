/** Mean Earth radius R₁ = 6,371,008.8 m (IUGG; Moritz 1980, "Geodetic Reference System 1980"). */
export const EARTH_MEAN_RADIUS_M = 6_371_008.8;

/**
 * Great-circle distance on the sphere of mean radius by the haversine formula (Sinnott 1984,
 * "Virtues of the Haversine", Sky and Telescope 68:159).
 *
 * @param lon1 longitude of the first point, degrees
 * @param lat1 latitude of the first point, degrees
 * @param lon2 longitude of the second point, degrees
 * @param lat2 latitude of the second point, degrees
 * @returns metres
 * @example
 * haversineMetres(0, 0, 0, 1); // ≈ 111,195 m
 */
export function haversineMetres(lon1: number, lat1: number, lon2: number, lat2: number): number {
  const r = Math.PI / 180;
  const dLat = (lat2 - lat1) * r;
  const dLon = (lon2 - lon1) * r;
  const a = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * r) * Math.cos(lat2 * r) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_MEAN_RADIUS_M * Math.asin(Math.min(1, Math.sqrt(a)));
}

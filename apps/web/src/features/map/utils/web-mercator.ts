/** Web Mercator (EPSG:3857) in the unit square MapLibre uses: x east 0→1 from −180°, y SOUTH 0→1 from the north edge. */
export type MercatorPoint = { x: number; y: number };

/** Latitude where the square Web Mercator world ends (atan(sinh π), in degrees). */
export const MERCATOR_MAX_LAT = 85.0511287798066;

/**
 * Projects longitude/latitude (WGS84 degrees) to unit-square Web Mercator.
 * Formula: x = (λ + 180°)/360°, y = (1 − ln(tan(π/4 + φ/2))/π)/2 (EPSG Guidance Note 7-2, §1.3.3.2, spherical form).
 * @param lon longitude in degrees
 * @param lat latitude in degrees (clamped to ±85.0511°)
 * @returns x, y in [0, 1], y growing southward
 * @example mercatorFromLonLat(0, 0) // { x: 0.5, y: 0.5 }
 */
export function mercatorFromLonLat(lon: number, lat: number): MercatorPoint {
  const phi = (Math.max(-MERCATOR_MAX_LAT, Math.min(MERCATOR_MAX_LAT, lat)) * Math.PI) / 180;
  return { x: (lon + 180) / 360, y: (1 - Math.log(Math.tan(Math.PI / 4 + phi / 2)) / Math.PI) / 2 };
}

/**
 * The inverse of {@link mercatorFromLonLat}.
 * @param x unit-square x (0 = 180° W)
 * @param y unit-square y (0 = north edge)
 * @returns longitude and latitude in degrees
 * @example lonLatFromMercator(0.5, 0.5) // { lon: 0, lat: 0 }
 */
export function lonLatFromMercator(x: number, y: number): { lon: number; lat: number } {
  const lat = (Math.atan(Math.sinh(Math.PI * (1 - 2 * y))) * 180) / Math.PI;
  return { lon: x * 360 - 180, lat };
}

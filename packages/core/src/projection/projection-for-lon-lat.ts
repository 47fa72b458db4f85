import { CoreError } from '../errors.js';
import { formatNumber } from '../lib/format-number.js';
import { haversineMetres } from '../lib/haversine.js';
import { lonLatSpan } from '../lib/lon-lat-span.js';
import { projectionUtmZone } from './projection-utm-zone.js';

/** Which local projection to use: UTM (default) or a Lambert azimuthal equal-area on the data. */
export type ProjectionKind = 'utm' | 'laea';

/** A local metric projection chosen for a data set; plain data, safe to store as JSON. */
export interface LocalProjection {
  kind: ProjectionKind;
  /** EPSG code for UTM zones; null for the data-centred LAEA, which has no registry code. */
  epsg: number | null;
  /** proj4 definition string. */
  proj4: string;
  /** Plain-words name for the UI, e.g. "UTM zone 31N (EPSG:32631)". */
  label: string;
  /** Centre of the data (mean lon/lat), degrees. */
  centerLon: number;
  centerLat: number;
}

/**
 * Largest distance (degrees of longitude) from a UTM zone's central meridian allowed: the zone's
 * own 3° plus 1.5°. At the equator the scale factor there is 0.9996 / cos 4.5° ≈ 1.0027, so
 * distances are off by < 0.3 % [D, spherical transverse Mercator k = k₀ / √(1 − (cos φ sin Δλ)²)].
 */
export const UTM_MAX_OFFSET_DEG = 4.5;
/** UTM's latitude limits (NIMA TM 8358.2): 80°S to 84°N; polar data needs another projection. */
export const UTM_LAT_MIN = -80;
export const UTM_LAT_MAX = 84;
/**
 * Largest distance (metres) from the centre allowed for the LAEA projection. Its scale error at
 * great-circle angle c from the centre is 1/cos(c/2) − 1 (Snyder 1987, "Map Projections — A Working
 * Manual", p. 185): at 1,000 km that is 0.31 %, matching the UTM limit.
 */
export const LAEA_MAX_RADIUS_M = 1_000_000;

/**
 * Chooses a local metric projection for lon/lat data. UTM: the zone of the data's mean longitude
 * (north/south by mean latitude), EPSG 326zz/327zz. LAEA: `+proj=laea` centred on the data's mean,
 * for data near the poles or wider than a UTM zone allows. Longitudes are averaged across the
 * antimeridian when the data crosses it.
 *
 * @param lon longitudes, degrees (validated: finite, within ±180)
 * @param lat latitudes, degrees (validated: finite, within ±90)
 * @param options `projection`: 'utm' (default) or 'laea'
 * @returns the projection (plain data)
 * @throws CoreError PROJECTION_SPAN when the data is too wide or too close to a pole for the choice
 * @example
 * projectionForLonLat(Float64Array.of(3.4, 3.6), Float64Array.of(45.4, 45.6)).label; // "UTM zone 31N (EPSG:32631)"
 */
export function projectionForLonLat(
  lon: Float64Array,
  lat: Float64Array,
  options: { projection?: ProjectionKind } = {},
): LocalProjection {
  const kind = options.projection ?? 'utm';
  if (lon.length === 0 || lon.length !== lat.length) {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `lon and lat must be non-empty arrays of the same length (got ${lon.length} and ${lat.length})`,
      'lon',
    );
  }
  const s = lonLatSpan(lon, lat);
  const spanText = `${formatNumber(s.lonSpan, 2)}° of longitude (${formatNumber(s.west, 3)}° to ${formatNumber(s.east > 180 ? s.east - 360 : s.east, 3)}°) and latitudes ${formatNumber(s.south, 3)}° to ${formatNumber(s.north, 3)}°`;
  if (kind === 'utm') {
    const z = projectionUtmZone(s.meanLon, s.meanLat);
    if (s.north > UTM_LAT_MAX || s.south < UTM_LAT_MIN) {
      throw new CoreError(
        'PROJECTION_SPAN',
        `the points reach latitude ${formatNumber(s.north > UTM_LAT_MAX ? s.north : s.south, 3)}°, beyond UTM's limits (80°S to 84°N); use projection 'laea' (equal-area, centred on the data) for polar data`,
        'projection',
        { span: s },
      );
    }
    let offset = 0;
    for (let i = 0; i < lon.length; i++) {
      const d = Math.abs(((((lon[i] - z.centralMeridian + 180) % 360) + 360) % 360) - 180);
      if (d > offset) offset = d;
    }
    if (offset > UTM_MAX_OFFSET_DEG) {
      throw new CoreError(
        'PROJECTION_SPAN',
        `the points span ${spanText}, reaching ${formatNumber(offset, 2)}° from the central meridian of UTM zone ${z.zone} (${z.centralMeridian}°); more than ${UTM_MAX_OFFSET_DEG}° would distort distances by over 0.3 %. Use projection 'laea' (equal-area, centred on the data) for a wider region, or split the customer file by region`,
        'projection',
        { span: s, offsetDeg: offset, zone: z.zone },
      );
    }
    const label = `UTM zone ${z.zone}${z.hemisphere === 'north' ? 'N' : 'S'} (EPSG:${z.epsg})`;
    return { kind, epsg: z.epsg, proj4: z.proj4, label, centerLon: s.meanLon, centerLat: s.meanLat };
  }
  if (kind !== 'laea') {
    throw new CoreError('INVALID_ARGUMENT', `projection must be 'utm' or 'laea' (got "${String(kind)}")`, 'projection');
  }
  let radius = 0;
  for (let i = 0; i < lon.length; i++) {
    const d = haversineMetres(s.meanLon, s.meanLat, lon[i], lat[i]);
    if (d > radius) radius = d;
  }
  if (radius > LAEA_MAX_RADIUS_M) {
    throw new CoreError(
      'PROJECTION_SPAN',
      `the points span ${spanText}, reaching ${formatNumber(radius / 1000)} km from their centre; beyond ${formatNumber(LAEA_MAX_RADIUS_M / 1000)} km a single local projection distorts distances by over 0.3 %. Split the customer file by region and build one surface per region`,
      'projection',
      { span: s, radiusM: radius },
    );
  }
  const lon0 = round6(s.meanLon);
  const lat0 = round6(s.meanLat);
  return {
    kind,
    epsg: null,
    proj4: `+proj=laea +lat_0=${lat0} +lon_0=${lon0} +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs`,
    label: `Lambert azimuthal equal-area centred on ${formatNumber(lat0, 4)}°, ${formatNumber(lon0, 4)}°`,
    centerLon: s.meanLon,
    centerLat: s.meanLat,
  };
}

/** Six decimals of a degree (≈ 0.1 m) keep the proj4 string short and reproducible. */
function round6(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}

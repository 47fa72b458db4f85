/** A UTM zone on WGS84 with its EPSG code. */
export interface UtmZone {
  /** 1–60. */
  zone: number;
  hemisphere: 'north' | 'south';
  /** EPSG:326zz (north) or EPSG:327zz (south). */
  epsg: number;
  /** Longitude of the zone's central meridian, degrees. */
  centralMeridian: number;
  /** proj4 definition string. */
  proj4: string;
}

/**
 * The regular 6° UTM zone containing a longitude: zone = floor((lon + 180) / 6) + 1, north or
 * south by latitude (NIMA TM 8358.2, "The Universal Grids"). The Norway/Svalbard exceptions are
 * not applied: the regular zone's CRS is defined everywhere, and only distortion matters here.
 *
 * @param lon longitude, degrees (any value; wrapped to [-180, 180))
 * @param lat latitude, degrees; ≥ 0 chooses the northern hemisphere
 * @returns the zone, EPSG code and proj4 string
 * @example
 * projectionUtmZone(3.5, 45.5); // { zone: 31, hemisphere: 'north', epsg: 32631, centralMeridian: 3, ... }
 */
export function projectionUtmZone(lon: number, lat: number): UtmZone {
  const wrapped = ((((lon + 180) % 360) + 360) % 360) - 180;
  const zone = Math.min(60, Math.floor((wrapped + 180) / 6) + 1);
  const hemisphere = lat >= 0 ? 'north' : 'south';
  return {
    zone,
    hemisphere,
    epsg: (hemisphere === 'north' ? 32600 : 32700) + zone,
    centralMeridian: zone * 6 - 183,
    proj4: `+proj=utm +zone=${zone}${hemisphere === 'south' ? ' +south' : ''} +datum=WGS84 +units=m +no_defs`,
  };
}

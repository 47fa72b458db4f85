import { lonLatFromMercator, mercatorFromLonLat } from './web-mercator';

/** Outer edges of a raster in degrees: west, south, east, north. */
export type RasterBounds = [west: number, south: number, east: number, north: number];

/**
 * A surface resampled by the server onto a Web Mercator pixel grid: row 0 is the NORTH row, rows are
 * evenly spaced in Mercator y (not in latitude), NaN marks cells outside the study area.
 */
export type WebRaster = {
  width: number;
  height: number;
  bounds: RasterBounds;
  /** Values per km² or per sq mi (see `unit`), row-major from the north-west corner. */
  values: Float32Array;
  unit: 'km2' | 'sqmi';
  /** Largest finite value, as the server reported it. */
  max: number;
};

/**
 * The four corners in the order MapLibre's image source expects: top-left, top-right, bottom-right, bottom-left.
 * MapLibre stretches the image linearly between them in Mercator space, which matches the server's grid.
 * @param bounds west, south, east, north
 * @returns `[[w, n], [e, n], [e, s], [w, s]]`
 * @example rasterCorners([-39, 44, -38, 45]) // [[-39, 45], [-38, 45], [-38, 44], [-39, 44]]
 */
export function rasterCorners(bounds: RasterBounds): [[number, number], [number, number], [number, number], [number, number]] {
  const [w, s, e, n] = bounds;
  return [
    [w, n],
    [e, n],
    [e, s],
    [w, s],
  ];
}

/**
 * Where a lon/lat falls on the raster, in fractional pixel units (column from the west edge, row from
 * the north edge), interpolating in Mercator y as MapLibre does when it draws the image.
 * @param raster size and bounds
 * @param lon longitude in degrees
 * @param lat latitude in degrees
 * @returns fractional column and row; pixel (c, r) covers [c, c+1) × [r, r+1)
 * @example rasterPixelFromLonLat(raster, -38.5, 44.5) // { col: 511.7, row: 498.2 }
 */
export function rasterPixelFromLonLat(raster: Pick<WebRaster, 'width' | 'height' | 'bounds'>, lon: number, lat: number) {
  const [w, s, e, n] = raster.bounds;
  const topLeft = mercatorFromLonLat(w, n);
  const bottomRight = mercatorFromLonLat(e, s);
  const p = mercatorFromLonLat(lon, lat);
  return {
    col: ((p.x - topLeft.x) / (bottomRight.x - topLeft.x)) * raster.width,
    row: ((p.y - topLeft.y) / (bottomRight.y - topLeft.y)) * raster.height,
  };
}

/**
 * The lon/lat of a pixel's centre (the inverse of {@link rasterPixelFromLonLat}).
 * @param raster size and bounds
 * @param col column, 0 = west
 * @param row row, 0 = north
 * @returns the centre in degrees
 * @example rasterPixelCentre(raster, 0, 0) // the north-west pixel's centre
 */
export function rasterPixelCentre(raster: Pick<WebRaster, 'width' | 'height' | 'bounds'>, col: number, row: number) {
  const [w, s, e, n] = raster.bounds;
  const topLeft = mercatorFromLonLat(w, n);
  const bottomRight = mercatorFromLonLat(e, s);
  return lonLatFromMercator(
    topLeft.x + ((col + 0.5) / raster.width) * (bottomRight.x - topLeft.x),
    topLeft.y + ((row + 0.5) / raster.height) * (bottomRight.y - topLeft.y),
  );
}

/**
 * The value of the pixel under a lon/lat (the hover read-out samples the fetched raster, no request).
 * @param raster the fetched raster
 * @param lon longitude in degrees
 * @param lat latitude in degrees
 * @returns the value; NaN inside the raster where there is no data; null outside the raster
 * @example rasterValueAt(raster, -38.5, 44.5) // 412.7
 */
export function rasterValueAt(raster: WebRaster, lon: number, lat: number): number | null {
  const { col, row } = rasterPixelFromLonLat(raster, lon, lat);
  const c = Math.floor(col);
  const r = Math.floor(row);
  if (!(c >= 0 && c < raster.width && r >= 0 && r < raster.height)) return null;
  return raster.values[c + r * raster.width];
}

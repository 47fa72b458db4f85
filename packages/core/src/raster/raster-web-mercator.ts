import { CoreError } from '../errors.js';
import { gridBilinearAt } from '../grid/grid-bilinear-at.js';
import type { ProjectionConverter } from '../projection/projection-transform.js';
import type { GridSpec } from '../types.js';

/** WGS84 semi-major axis, the sphere radius of Web Mercator (EPSG:3857, IOGP Guidance Note 7-2 §1.3.3.2). */
const MERCATOR_RADIUS_M = 6_378_137;
/** Web Mercator's latitude limit, degrees (the square world of EPSG:3857). */
const MERCATOR_MAX_LAT = 85.05112878;
/** Boundary samples per grid edge when finding the lon/lat box: projected edges are curves. */
const EDGE_SAMPLES = 32;

/** A north-up pixel grid in Web Mercator (row 0 = north) and its outer corners in lon/lat. */
export interface WebMercatorLayout {
  width: number;
  height: number;
  /** Pixel side in Web Mercator metres. */
  pixelSize: number;
  /** Mercator x of the west edge and y of the north edge, metres. */
  west: number;
  north: number;
  /** Outer corners in degrees: west, south, east, north. */
  bounds: { west: number; south: number; east: number; north: number };
}

/** A surface resampled onto a {@link WebMercatorLayout}; NaN outside the source grid or study area. */
export interface WebMercatorRaster extends WebMercatorLayout {
  values: Float32Array;
  /** Largest finite value (0 when none). */
  max: number;
}

type Converter = Pick<ProjectionConverter, 'forwardPoint' | 'inversePoint'>;

function mercatorX(lon: number): number {
  return (MERCATOR_RADIUS_M * lon * Math.PI) / 180;
}
function mercatorY(lat: number): number {
  const phi = (Math.max(-MERCATOR_MAX_LAT, Math.min(MERCATOR_MAX_LAT, lat)) * Math.PI) / 180;
  return MERCATOR_RADIUS_M * Math.log(Math.tan(Math.PI / 4 + phi / 2));
}
function lonOfX(x: number): number {
  return (x / MERCATOR_RADIUS_M) * (180 / Math.PI);
}
function latOfY(y: number): number {
  return (2 * Math.atan(Math.exp(y / MERCATOR_RADIUS_M)) - Math.PI / 2) * (180 / Math.PI);
}

/**
 * The Web Mercator pixel grid covering a metric grid: the lon/lat box of the grid's boundary
 * (32 samples per edge), pixels about one cell wide at the centre latitude (Mercator stretches
 * ground distances by sec φ), made coarser when either side would exceed `maxSize` pixels.
 *
 * @param spec the metric grid (planar metres of the converter's projection)
 * @param converter the grid's projection (planar ↔ lon/lat)
 * @param maxSize largest width or height in pixels (default 1024)
 * @returns the layout; its `bounds` are the corners to place an image on a web map
 * @throws CoreError INVALID_ARGUMENT for a maxSize below 2 or an empty grid
 * @example
 * const layout = rasterWebMercatorLayout(spec, converter, 1024);
 */
export function rasterWebMercatorLayout(spec: GridSpec, converter: Converter, maxSize = 1024): WebMercatorLayout {
  if (!(Number.isInteger(maxSize) && maxSize >= 2)) {
    throw new CoreError('INVALID_ARGUMENT', `maxSize must be a whole number of pixels ≥ 2 (got ${String(maxSize)})`, 'maxSize');
  }
  if (!(spec.width > 0 && spec.height > 0 && spec.cellSize > 0)) {
    throw new CoreError('INVALID_ARGUMENT', `the grid must have cells (got ${spec.width} × ${spec.height})`, 'spec');
  }
  const w = spec.width * spec.cellSize;
  const h = spec.height * spec.cellSize;
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (let k = 0; k <= EDGE_SAMPLES; k++) {
    const t = k / EDGE_SAMPLES;
    for (const [px, py] of [
      [spec.originX + t * w, spec.originY],
      [spec.originX + t * w, spec.originY + h],
      [spec.originX, spec.originY + t * h],
      [spec.originX + w, spec.originY + t * h],
    ]) {
      const [lon, lat] = converter.inversePoint(px, py);
      const x = mercatorX(lon);
      const y = mercatorY(lat);
      minX = Math.min(minX, x);
      maxX = Math.max(maxX, x);
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  }
  const centreLat = latOfY((minY + maxY) / 2);
  let pixelSize = spec.cellSize / Math.cos((centreLat * Math.PI) / 180);
  const longest = Math.max(maxX - minX, maxY - minY) / pixelSize;
  if (longest > maxSize) pixelSize *= longest / maxSize;
  const width = Math.max(1, Math.min(maxSize, Math.ceil((maxX - minX) / pixelSize - 1e-9)));
  const height = Math.max(1, Math.min(maxSize, Math.ceil((maxY - minY) / pixelSize - 1e-9)));
  // Grow the pixel slightly when the cap cut a side, so the layout still covers the whole grid.
  pixelSize = Math.max(pixelSize, (maxX - minX) / width, (maxY - minY) / height);
  const east = minX + width * pixelSize;
  const south = maxY - height * pixelSize;
  return {
    width,
    height,
    pixelSize,
    west: minX,
    north: maxY,
    bounds: { west: lonOfX(minX), south: latOfY(south), east: lonOfX(east), north: latOfY(maxY) },
  };
}

/**
 * Samples a metric grid at every pixel centre of a Web Mercator layout: pixel → lon/lat → planar
 * metres → bilinear value (`gridBilinearAt`); NaN outside the grid or where the source is NaN.
 *
 * @param layout from {@link rasterWebMercatorLayout} (of this grid or of another, for differences)
 * @param values the grid's values, row-major i + j·width, j = 0 south
 * @param spec the grid
 * @param converter the grid's projection
 * @returns Float32 values, row-major, row 0 = north
 * @example
 * const other = rasterWebMercatorSample(layout, otherValues, otherSpec, otherConverter);
 */
export function rasterWebMercatorSample(layout: WebMercatorLayout, values: ArrayLike<number>, spec: GridSpec, converter: Converter): Float32Array {
  if (values.length !== spec.width * spec.height) {
    throw new CoreError('INVALID_ARGUMENT', `values has ${values.length} entries but the grid has ${spec.width * spec.height} cells`, 'values');
  }
  const out = new Float32Array(layout.width * layout.height);
  const lons = new Float64Array(layout.width);
  for (let c = 0; c < layout.width; c++) lons[c] = lonOfX(layout.west + (c + 0.5) * layout.pixelSize);
  for (let r = 0; r < layout.height; r++) {
    const lat = latOfY(layout.north - (r + 0.5) * layout.pixelSize);
    for (let c = 0; c < layout.width; c++) {
      const [x, y] = converter.forwardPoint(lons[c], lat);
      out[c + r * layout.width] = gridBilinearAt(values, spec, x, y);
    }
  }
  return out;
}

/**
 * A metric surface reprojected for a web map: the Web Mercator layout covering the grid and its
 * values (see {@link rasterWebMercatorLayout} and {@link rasterWebMercatorSample}).
 *
 * @param values the grid's values (e.g. weight per km²), j = 0 south; NaN = no data
 * @param spec the grid
 * @param converter the grid's projection
 * @param options `maxSize` in pixels (default 1024)
 * @returns layout, Float32 values (row 0 = north) and the largest finite value
 * @example
 * const r = rasterWebMercator(intensity, spec, converter, { maxSize: 512 });
 * r.bounds; // { west, south, east, north } for an image source's corners
 */
export function rasterWebMercator(
  values: ArrayLike<number>,
  spec: GridSpec,
  converter: Converter,
  options: { maxSize?: number } = {},
): WebMercatorRaster {
  const layout = rasterWebMercatorLayout(spec, converter, options.maxSize);
  const out = rasterWebMercatorSample(layout, values, spec, converter);
  let max = 0;
  for (let k = 0; k < out.length; k++) if (out[k] > max) max = out[k];
  return { ...layout, values: out, max };
}

import { env } from '../../../config/env';
import { ApiError, isApiErrorBody } from '../../../lib/api-error';
import type { RasterBounds, WebRaster } from '../utils/web-raster';

/**
 * Reads a binary raster answer: Float32 little-endian values plus the `X-Raster-*` headers.
 * @param buffer the response body
 * @param headers the response headers
 * @returns the raster, values in a fresh Float32Array
 * @throws Error naming the header or size that is wrong
 * @example webRasterFromResponse(await response.arrayBuffer(), response.headers)
 */
export function webRasterFromResponse(buffer: ArrayBuffer, headers: Headers): WebRaster {
  const header = (name: string) => {
    const value = headers.get(name);
    if (value === null || value === '') throw new Error(`The server's raster answer lacks the ${name} header; update the server or reload.`);
    return value;
  };
  const width = Number(header('X-Raster-Width'));
  const height = Number(header('X-Raster-Height'));
  if (!(Number.isInteger(width) && width > 0 && Number.isInteger(height) && height > 0)) {
    throw new Error(`X-Raster-Width and X-Raster-Height must be positive whole numbers (got ${width} × ${height}).`);
  }
  const bounds = header('X-Raster-Bounds').split(',').map(Number);
  if (bounds.length !== 4 || bounds.some((v) => !Number.isFinite(v)) || bounds[0] >= bounds[2] || bounds[1] >= bounds[3]) {
    throw new Error(`X-Raster-Bounds must be west,south,east,north in degrees with west < east and south < north (got ${headers.get('X-Raster-Bounds')}).`);
  }
  const unit = header('X-Raster-Unit');
  if (unit !== 'km2' && unit !== 'sqmi') throw new Error(`X-Raster-Unit must be km2 or sqmi (got ${unit}).`);
  const max = Number(header('X-Raster-Max'));
  if (buffer.byteLength !== width * height * 4) {
    throw new Error(`The raster holds ${buffer.byteLength} bytes but ${width} × ${height} Float32 values need ${width * height * 4}.`);
  }
  const view = new DataView(buffer);
  const values = new Float32Array(width * height);
  for (let i = 0; i < values.length; i++) values[i] = view.getFloat32(i * 4, true);
  return { width, height, bounds: bounds as RasterBounds, values, unit, max: Number.isFinite(max) ? max : 0 };
}

/**
 * GETs a binary raster from the API with the session cookie; `{ error }` answers become `ApiError`.
 * @param path path under `/api`
 * @param query query parameters
 * @param signal abort signal (TanStack Query passes one)
 * @returns the raster
 * @example const raster = await rasterRequest(`/organizations/${o}/workspaces/${w}/surfaces/${s}/web-raster`, { maxSize: 1024 });
 */
export async function rasterRequest(path: string, query: Record<string, string | number>, signal?: AbortSignal): Promise<WebRaster> {
  const url = new URL(`/api${path}`, env.VITE_API_ORIGIN || globalThis.location?.origin || 'http://localhost');
  for (const [key, value] of Object.entries(query)) url.searchParams.set(key, String(value));
  let response: Response;
  try {
    response = await fetch(url, { credentials: 'include', headers: { accept: 'application/octet-stream, application/json' }, signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'NETWORK_ERROR', 'Could not reach the Demandscape server to load the map layer. Check your connection and try again.');
  }
  if (!response.ok) {
    const text = await response.text().catch(() => '');
    let body: unknown = null;
    try {
      body = text ? JSON.parse(text) : null;
    } catch {
      body = null;
    }
    if (isApiErrorBody(body)) throw new ApiError(response.status, body.error.code, body.error.message, body.error.field);
    throw new ApiError(response.status, 'HTTP_ERROR', `The server answered ${response.status} while loading the map layer. Try again in a moment.`);
  }
  return webRasterFromResponse(await response.arrayBuffer(), response.headers);
}

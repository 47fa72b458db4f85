import { useMemo } from 'react';
import { canvasFromRgba } from '../lib/map-instance';
import { colourTable, densityInterpolator, differenceInterpolator } from '../utils/colour-ramp';
import { RASTER_FADE_SHARE, RASTER_FLOOR_SHARE, rasterMaxAbs, rasterRgba } from '../utils/raster-colouring';
import { rasterCorners, type WebRaster } from '../utils/web-raster';

const densityTable = colourTable(densityInterpolator);
const differenceTable = colourTable(differenceInterpolator);

/**
 * Colours a fetched raster into an image for the map (once per raster) and reports the top of its scale.
 * @param raster the surface or difference raster, or undefined while loading
 * @param kind sequential (demand) or diverging (difference)
 * @param sharedTop a scale top to use instead of the raster's own (side-by-side maps share one scale)
 * @returns the painted canvas with its corners and the scale top, or null with an error message when it cannot be drawn
 * @example const { image, scaleTop } = useRasterImage(raster.data, 'sequential');
 */
export function useRasterImage(raster: WebRaster | undefined, kind: 'sequential' | 'diverging', sharedTop?: number) {
  return useMemo(() => {
    if (!raster) return { image: null, scaleTop: 0, error: null };
    const top = sharedTop ?? (kind === 'sequential' ? raster.max : rasterMaxAbs(raster.values));
    if (!(top > 0)) return { image: null, scaleTop: 0, error: kind === 'sequential' ? 'This surface is zero everywhere.' : 'The two surfaces are the same everywhere.' };
    const floor = top * RASTER_FLOOR_SHARE;
    const scale = kind === 'sequential' ? { kind, max: top, floor, fade: RASTER_FADE_SHARE } : { kind, maxAbs: top, floor };
    try {
      const canvas = canvasFromRgba(rasterRgba(raster.values, kind === 'sequential' ? densityTable : differenceTable, scale), raster.width, raster.height);
      return { image: { canvas, corners: rasterCorners(raster.bounds) }, scaleTop: top, error: null };
    } catch (error) {
      return { image: null, scaleTop: top, error: error instanceof Error ? error.message : String(error) };
    }
  }, [raster, kind, sharedTop]);
}

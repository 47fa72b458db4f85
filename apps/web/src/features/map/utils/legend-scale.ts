import { legendTicks } from './legend-ticks';
import { tickText } from './density-unit';

/**
 * Tick positions along a legend bar for a sequential scale 0 → max.
 * @param max the top of the colour scale (> 0)
 * @param count about how many ticks
 * @returns ticks with position 0–1 and label
 * @example sequentialLegendTicks(437) // [{ position: 0, label: '0' }, { position: 0.229, label: '100' }, …]
 */
export function sequentialLegendTicks(max: number, count = 4) {
  if (!(max > 0)) return [{ position: 0, label: '0' }];
  return legendTicks(0, max, count).map((v) => ({ position: v / max, label: tickText(v) }));
}

/**
 * Tick positions for a diverging scale −maxAbs → +maxAbs centred on 0 (positive values get a + sign).
 * @param maxAbs the half-width of the scale (> 0)
 * @param count about how many ticks
 * @returns ticks with position 0–1 and label
 * @example divergingLegendTicks(80) // [{ position: 0.125, label: '−60' }, …, { position: 0.5, label: '0' }, …]
 */
export function divergingLegendTicks(maxAbs: number, count = 4) {
  if (!(maxAbs > 0)) return [{ position: 0.5, label: '0' }];
  return legendTicks(-maxAbs, maxAbs, count).map((v) => ({
    position: (v + maxAbs) / (2 * maxAbs),
    label: v > 0 ? `+${tickText(v)}` : v < 0 ? `−${tickText(-v)}` : '0',
  }));
}

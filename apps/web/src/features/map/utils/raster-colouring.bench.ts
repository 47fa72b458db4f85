/**
 * How long colouring a fetched surface takes in the browser's main thread (the map redraws it once per
 * raster). Run: `cd apps/web && npx tsx src/features/map/utils/raster-colouring.bench.ts`; prints a table.
 */
import { colourTable, densityInterpolator, differenceInterpolator } from './colour-ramp';
import { RASTER_FADE_SHARE, RASTER_FLOOR_SHARE, rasterMaxAbs, rasterRgba } from './raster-colouring';

function surface(side: number): Float32Array {
  const values = new Float32Array(side * side);
  for (let r = 0; r < side; r++) {
    for (let c = 0; c < side; c++) {
      const dx = (c - side / 2) / (side / 6);
      const dy = (r - side / 2) / (side / 6);
      values[c + r * side] = c < side / 20 ? Number.NaN : 400 * Math.exp(-(dx * dx + dy * dy) / 2) - 10;
    }
  }
  return values;
}

function bestOf(runs: number, work: () => void): number {
  let best = Infinity;
  for (let k = 0; k < runs; k++) {
    const start = performance.now();
    work();
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

const rows: string[][] = [];
const tableMs = bestOf(5, () => colourTable(densityInterpolator));
rows.push(['colour table (256 entries)', '–', tableMs.toFixed(2)]);
const cividis = colourTable(densityInterpolator);
const puor = colourTable(differenceInterpolator);
for (const side of [256, 512, 1024]) {
  const values = surface(side);
  const sequential = bestOf(5, () => rasterRgba(values, cividis, { kind: 'sequential', max: 390, floor: 390 * RASTER_FLOOR_SHARE, fade: RASTER_FADE_SHARE }));
  rows.push([`sequential colouring ${side}×${side}`, (side * side).toLocaleString('en'), sequential.toFixed(1)]);
  const diverging = bestOf(5, () => {
    const top = rasterMaxAbs(values);
    rasterRgba(values, puor, { kind: 'diverging', maxAbs: top, floor: top * RASTER_FLOOR_SHARE });
  });
  rows.push([`diverging colouring ${side}×${side} (incl. max |v|)`, (side * side).toLocaleString('en'), diverging.toFixed(1)]);
}
const widths = [0, 1, 2].map((i) => Math.max(...[['case', 'cells', 'best of 5 (ms)'], ...rows].map((r) => r[i].length)));
const line = (r: string[]) => `| ${r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join(' | ')} |`;
process.stdout.write(`${[line(['case', 'cells', 'best of 5 (ms)']), `|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`, ...rows.map(line)].join('\n')}\n`);

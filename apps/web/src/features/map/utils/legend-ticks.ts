/**
 * Round tick values (1, 2 or 5 × 10ᵏ apart) covering [start, stop], the usual "nice numbers" rule
 * (Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990).
 * @param start lower end
 * @param stop upper end (≥ start)
 * @param count about how many ticks to aim for (≥ 1)
 * @returns the ticks inside [start, stop], ascending
 * @example legendTicks(0, 437, 5) // [0, 100, 200, 300, 400]
 */
export function legendTicks(start: number, stop: number, count = 5): number[] {
  if (!Number.isFinite(start) || !Number.isFinite(stop) || stop < start) {
    throw new Error(`legend range must be finite with stop ≥ start (got ${start}..${stop})`);
  }
  if (!(count >= 1)) throw new Error(`tick count must be at least 1 (got ${count})`);
  if (stop === start) return [start];
  const raw = (stop - start) / count;
  const power = Math.floor(Math.log10(raw));
  const unit = 10 ** power;
  const fraction = raw / unit;
  // Thresholds √50, √10, √2 pick the step closest (in ratio) to the raw one.
  const multiple = fraction >= Math.sqrt(50) ? 10 : fraction >= Math.sqrt(10) ? 5 : fraction >= Math.sqrt(2) ? 2 : 1;
  const ticks: number[] = [];
  // Integer arithmetic on (multiple × 10^power) avoids 0.30000000000000004-style ticks.
  if (power >= 0) {
    const step = multiple * unit;
    for (let k = Math.ceil(start / step); k * step <= stop; k++) ticks.push(k * step);
  } else {
    const inverse = 10 ** -power / multiple;
    for (let k = Math.ceil(start * inverse); k / inverse <= stop; k++) ticks.push(k / inverse);
  }
  return ticks;
}

const PLAIN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Parses one cell as a finite number. Accepts `12`, `-8.25`, `1e3`, surrounding spaces and, when
 * `decimalComma` is set, `12,5` (a point is still read as a decimal point there when no comma is
 * present). Rejects empty cells, thousands separators, hex, `Infinity` and anything else.
 * @param text - the raw cell text
 * @param decimalComma - the file writes decimals with a comma
 * @returns the number, or null when the cell is empty (after trimming), or NaN when it is not a number
 * @example
 * cellNumber(' 53,125 ', true); // 53.125
 */
export function cellNumber(text: string | undefined, decimalComma: boolean): number | null {
  if (text === undefined) return null;
  let t = text.trim();
  if (t === '') return null;
  if (decimalComma && t.includes(',')) t = t.replace(',', '.');
  if (!PLAIN.test(t)) return NaN;
  const value = Number(t);
  return Number.isFinite(value) ? value : NaN;
}

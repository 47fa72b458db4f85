/**
 * Formats benchmark rows as a Markdown table (readable in a terminal, pasteable into README.md).
 *
 * @param header column titles
 * @param rows cells as strings, one array per row
 * @returns the table, one line per row
 * @example
 * benchTable(['N', 'time'], [['10⁴', '0.02 s']]);
 */
export function benchTable(header: string[], rows: string[][]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? '').length)));
  const line = (cells: string[]): string =>
    `| ${cells.map((s, c) => (c < 1 ? s.padEnd(widths[c]) : s.padStart(widths[c]))).join(' | ')} |`;
  return [line(header), `|${widths.map((w, c) => (c < 1 ? `:${'-'.repeat(w + 1)}` : `${'-'.repeat(w + 1)}:`)).join('|')}|`, ...rows.map(line)].join('\n');
}

/** Seconds with three significant figures, e.g. 0.0123 s, 1.23 s, 123 s. */
export function benchSeconds(s: number): string {
  return s >= 100 ? `${s.toFixed(0)} s` : `${s.toPrecision(3)} s`;
}

/** A power of ten as 10⁴ … 10⁶, else the plain number. */
export function benchCount(n: number): string {
  const sup = ['⁰', '¹', '²', '³', '⁴', '⁵', '⁶', '⁷', '⁸', '⁹'];
  const e = Math.log10(n);
  return Number.isInteger(e) ? `10${sup[e]}` : n.toLocaleString('en-US');
}

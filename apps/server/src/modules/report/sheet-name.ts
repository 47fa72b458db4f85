/** Excel's limit on worksheet names (characters). */
export const SHEET_NAME_MAX = 31;

/**
 * A worksheet name Excel accepts, unique in the workbook: the characters [ ] : * ? / \ and control
 * characters become spaces, no leading or trailing apostrophe, at most 31 UTF-16 code units, "History"
 * avoided (Excel reserves it) and a " (2)", " (3)" … suffix when the name is taken (compared
 * without case, as Excel does). Adds the result to `used`.
 * @param wanted - the name to start from (e.g. "1 Quay corner")
 * @param used - lower-cased names already in the workbook (updated)
 * @returns the name to use
 * @example
 * const used = new Set(['summary']);
 * sheetNameUnique('Summary', used); // 'Summary (2)'
 */
export function sheetNameUnique(wanted: string, used: Set<string>): string {
  const cleaned = wanted
    // eslint-disable-next-line no-control-regex
    .replace(/[[\]:*?/\\\u0000-\u001f\u007f]/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^'+|'+$/g, '')
    .trim();
  let base = cleaned === '' ? 'Sheet' : cleaned;
  if (base.toLowerCase() === 'history') base = 'History (site)';
  // Excel counts UTF-16 code units; a surrogate pair is kept whole or dropped whole.
  const fit = (text: string, max: number) => {
    let out = '';
    for (const ch of text) {
      if (out.length + ch.length > max) break;
      out += ch;
    }
    return out.trimEnd().replace(/'+$/, '');
  };
  let name = fit(base, SHEET_NAME_MAX);
  for (let n = 2; used.has(name.toLowerCase()); n++) {
    const suffix = ` (${n})`;
    name = fit(base, SHEET_NAME_MAX - suffix.length) + suffix;
  }
  used.add(name.toLowerCase());
  return name;
}

const NUMBER = /^[+-]?(?:\d+[.,]?\d*|[.,]\d+)(?:[eE][+-]?\d+)?$/;

/**
 * One CSV cell: quoted when it holds a comma, quote or line break; a text starting with `=`, `+`,
 * `-`, `@`, tab or carriage return that is not a plain number gets a leading `'` so spreadsheet
 * programs do not run it as a formula (OWASP "CSV Injection" [S]).
 * @param text - the raw text
 * @returns the CSV-safe cell
 * @example
 * csvCell('=HYPERLINK("x")'); // `"'=HYPERLINK(""x"")"`
 */
export function csvCell(text: string): string {
  let t = text;
  if (/^[=+\-@\t\r]/.test(t) && !NUMBER.test(t.trim())) t = `'${t}`;
  return /[",\r\n]/.test(t) ? `"${t.replace(/"/g, '""')}"` : t;
}

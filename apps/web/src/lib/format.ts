/**
 * A date and time in the reader's locale, e.g. "3 Dec 2026, 14:05".
 * @param iso an ISO-8601 timestamp from the API
 * @returns the formatted text, or the input unchanged when it is not a date
 * @example dateTimeText('2026-12-03T14:05:00Z')
 */
export function dateTimeText(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleString(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}

/**
 * A calendar date in the reader's locale, e.g. "3 Dec 2026".
 * @param iso an ISO-8601 timestamp from the API
 * @returns the formatted text, or the input unchanged when it is not a date
 * @example dateText('2026-12-03T14:05:00Z')
 */
export function dateText(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

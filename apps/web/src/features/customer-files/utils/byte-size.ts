const units = ['bytes', 'KB', 'MB', 'GB'] as const;

/**
 * A byte count in binary units (1 MB = 1024² bytes), the way upload limits such as 200 × 1024² are set.
 * @param bytes a whole number ≥ 0
 * @returns e.g. "200 MB", "1.4 KB", "512 bytes"
 * @example byteSizeText(200 * 1024 * 1024) // '200 MB'
 */
export function byteSizeText(bytes: number): string {
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  const digits = unit === 0 || value >= 100 ? 0 : 1;
  return `${value.toLocaleString('en', { maximumFractionDigits: digits })} ${units[unit]}`;
}

/**
 * A whole count with thousands separators, e.g. "48,210".
 * @param n the count
 * @returns the text
 * @example countText(48210) // '48,210'
 */
export function countText(n: number): string {
  return n.toLocaleString('en');
}

/**
 * Money from minor units (cents) in the reader's locale, with the currency symbol.
 * @param amount minor units, e.g. 6000
 * @param currency ISO 4217 code in any case, e.g. 'eur'
 * @returns e.g. "€60.00"
 * @example moneyText(3900, 'eur') // '€39.00'
 */
export function moneyText(amount: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(amount / 100);
}

/**
 * A whole number with thousands separators, for credits and seats.
 * @param value the number
 * @returns e.g. "2,000"
 * @example countText(2000) // '2,000'
 */
export function countText(value: number): string {
  return new Intl.NumberFormat('en-GB').format(value);
}

/**
 * A signed credit amount for the ledger: "+500", "−12" (true minus sign), "0".
 * @param amount signed credits
 * @returns the text
 * @example signedCreditsText(-12) // '−12'
 */
export function signedCreditsText(amount: number): string {
  if (amount > 0) return `+${countText(amount)}`;
  if (amount < 0) return `\u2212${countText(-amount)}`;
  return '0';
}

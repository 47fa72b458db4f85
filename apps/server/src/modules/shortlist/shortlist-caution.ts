/**
 * The real-estate caution shown beside every shortlist and ranking: the API's `caution` field, the
 * web pages and the XLSX reports all use this one text (PRODUCT.md rules).
 */
export const SHORTLIST_CAUTION =
  'The demand surface is an estimate from a sample of customers, not a count of every customer. Leases, zoning and local rules need review by licensed professionals before any decision.';

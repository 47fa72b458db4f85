/** Said wherever a customer file is uploaded or mapped (PRODUCT.md: customer locations are personal data). */
export const PRIVACY_LINE = 'Only coordinates and the weight are kept; names, addresses and other columns are discarded at import.';

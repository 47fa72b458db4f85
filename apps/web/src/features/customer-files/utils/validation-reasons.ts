/** Plain-words explanation of each validation reason code the server reports. */
export const reasonExplanations: Record<string, { title: string; explanation: string }> = {
  'missing-coordinate': {
    title: 'Missing coordinate',
    explanation: 'The longitude or latitude cell is empty, so the customer cannot be placed on the map.',
  },
  'non-numeric-coordinate': {
    title: 'Coordinate is not a number',
    explanation: 'The longitude or latitude holds text (for example an address) instead of decimal degrees.',
  },
  'latitude-out-of-range': {
    title: 'Latitude out of range',
    explanation: 'Latitude must lie between −90 and 90 degrees; this value cannot be a place on Earth.',
  },
  'longitude-out-of-range': {
    title: 'Longitude out of range',
    explanation: 'Longitude must lie between −180 and 180 degrees; this value cannot be a place on Earth.',
  },
  'likely-swapped': {
    title: 'Longitude and latitude look swapped',
    explanation:
      'The latitude is beyond ±90° but the longitude would be a valid latitude: the two columns are probably exchanged. Check the mapping.',
  },
  'null-island': {
    title: 'Placed at 0°, 0°',
    explanation: 'Both coordinates are exactly zero, which geocoders write when they could not find an address.',
  },
  'negative-weight': {
    title: 'Negative weight',
    explanation: 'Demand cannot be negative; refunds or corrections should be netted before upload.',
  },
  'non-numeric-weight': {
    title: 'Weight is not a number',
    explanation: 'The weight cell holds text; use a plain number such as 1250.50.',
  },
  'duplicate-row': {
    title: 'Exact duplicate of an earlier row',
    explanation: 'Kept, but flagged: the same coordinates and weight appear earlier in the file, which may be a double export.',
  },
  outlier: {
    title: 'Far from the other customers',
    explanation:
      'Kept unless you exclude flagged rows: the point lies more than 5 times the typical distance from the centre of the customers (at least 1 km), often a geocoding error.',
  },
};

/**
 * The title and explanation for a reason code; unknown codes are shown as they are.
 * @param code a reason code from the validation report
 * @returns a title and a one-sentence explanation
 * @example reasonText('null-island').title // 'Placed at 0°, 0°'
 */
export function reasonText(code: string): { title: string; explanation: string } {
  return reasonExplanations[code] ?? { title: code, explanation: 'The server gave this reason without a description here.' };
}

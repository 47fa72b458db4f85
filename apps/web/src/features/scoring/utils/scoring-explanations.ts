import type { ScoringMeasure } from '../types';

/** One line per setting: what it does to the result, the suggested value and why. */
export const settingExplanations = {
  alpha:
    'How strongly a bigger or better store pulls customers (attractiveness raised to α). 1, the suggested value, means twice the floor area draws twice the pull, as in Huff’s 1963 model.',
  beta:
    'How fast a store’s pull fades with distance (distance raised to −β). Larger β: customers are less willing to travel, typical for everyday goods such as bread and coffee. 2, the suggested value, is the usual default since Huff (1963).',
  radii:
    'Rings around each site: the demand inside each is shown beside the score. Suggested 1, 3 and 5 km: a walk, a short drive and a longer drive.',
  measure: 'What orders the ranking. Net new demand (suggested) counts only what a site adds to the chain, not what it takes from our own stores.',
  minDistance:
    'Demand right on top of a store would otherwise count as infinitely close and take all the pull. Blank (suggested) uses half a grid cell: demand in a store’s own cell counts as half a cell away.',
};

/** The ranking measures in plain words; ring measures are added per ring. */
export const measureOptions: { value: Exclude<ScoringMeasure, `ring:${number}`>; label: string }[] = [
  { value: 'netNew', label: 'Net new demand (suggested)' },
  { value: 'captured', label: 'Captured demand' },
  { value: 'shareOfTotal', label: 'Share of all demand' },
  { value: 'cannibalization', label: 'Cannibalization (lower is better)' },
];

/**
 * The name of a measure, for headings and the ranking's value column.
 * @param measure the measure
 * @param ringLabels the rings' radii as text (e.g. ["1 km", "3 km"]) for ring measures
 * @returns the label
 * @example measureLabel('ring:1', ['1 km', '3 km']) // 'Demand within 3 km'
 */
export function measureLabel(measure: ScoringMeasure, ringLabels: string[]): string {
  const ring = /^ring:(\d+)$/.exec(measure);
  if (ring) return `Demand within ${ringLabels[Number(ring[1])] ?? `ring ${Number(ring[1]) + 1}`}`;
  return measureOptions.find((m) => m.value === measure)?.label.replace(' (suggested)', '') ?? measure;
}

/** Said under every ranking (PRODUCT.md): the numbers come from an estimate and do not settle a site on their own. */
export const SCORING_CAUTION_LINE =
  'These scores rest on a demand surface estimated from a sample of customers. Leases, zoning and local rules need review by licensed professionals before any site is chosen.';

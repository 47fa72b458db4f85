import type { ScoringMeasure } from './scoring.types.js';

/** What the sentence needs about one candidate (demand in the run's weight unit). */
export interface ExplanationInput {
  captured: number;
  shareOfTotal: number;
  cannibalization: number;
  /** Own stores that lose demand, any order. */
  cannibalizedFrom: ReadonlyArray<{ name: string; demand: number }>;
  netNew: number;
  rank: number;
  candidateCount: number;
  measure: ScoringMeasure;
  /** Ring radii in metres (for `ring:k` measures) and the demand inside each. */
  rings: ReadonlyArray<{ radiusM: number; demand: number }>;
  ownStoreCount: number;
  /** E.g. "customers" or "visits per year". */
  weightLabel: string;
  radiusUnit: 'km' | 'mi';
}

/**
 * A demand figure in words: three significant figures from 1,000 up (12,400), whole numbers
 * from 10, one decimal below.
 * @param v demand
 * @returns grouped text
 * @example
 * demandText(12_437.2); // "12,400"
 */
export function demandText(v: number): string {
  const a = Math.abs(v);
  if (a >= 1000) {
    const step = 10 ** (Math.floor(Math.log10(a)) - 2);
    return (Math.round(v / step) * step).toLocaleString('en-GB', { maximumFractionDigits: 0 });
  }
  if (a >= 10 || a === 0) return Math.round(v).toLocaleString('en-GB');
  return v.toLocaleString('en-GB', { maximumFractionDigits: 1 });
}

function percentText(share: number): string {
  const p = share * 100;
  return `${p.toLocaleString('en-GB', { maximumFractionDigits: p >= 10 ? 0 : 1 })} %`;
}

function radiusText(radiusM: number, unit: 'km' | 'mi'): string {
  const v = unit === 'mi' ? radiusM / 1609.344 : radiusM / 1000;
  return `${v.toLocaleString('en-GB', { maximumFractionDigits: 2 })} ${unit}`;
}

/**
 * The plain-words name of a ranking measure.
 * @param measure the run's measure
 * @param rings ring radii in metres (for `ring:k`)
 * @param unit the radius unit to show
 * @returns e.g. "net new demand" or "demand within 3 km"
 * @example
 * measureText('ring:1', [{ radiusM: 3000, demand: 0 }], 'km'); // "demand within 3 km"
 */
export function measureText(measure: ScoringMeasure, rings: ReadonlyArray<{ radiusM: number }>, unit: 'km' | 'mi'): string {
  if (measure === 'netNew') return 'net new demand';
  if (measure === 'captured') return 'captured demand';
  if (measure === 'shareOfTotal') return 'share of all demand';
  if (measure === 'cannibalization') return 'least demand taken from own stores';
  const k = Number(measure.slice('ring:'.length));
  return rings[k] ? `demand within ${radiusText(rings[k].radiusM, unit)}` : 'ring demand';
}

/**
 * Why a candidate ranks where it does, in plain words with numbers and units, e.g. "Captures
 * 12,400 customers (4.1 % of all demand); 3,100 of them would come from own stores (most from
 * Harbour Row: 2,000), so 9,300 are new to the chain. Ranks 2 of 8 by net new demand."
 * @param x the candidate's parts
 * @returns one or two sentences
 * @example
 * candidateExplanation({ captured: 12400, shareOfTotal: 0.041, cannibalization: 3100, … });
 */
export function candidateExplanation(x: ExplanationInput): string {
  const unit = x.weightLabel.trim() || 'customers';
  let first = `Captures ${demandText(x.captured)} ${unit} (${percentText(x.shareOfTotal)} of all demand)`;
  if (x.ownStoreCount === 0) {
    first += '; there are no own stores to lose any of it, so all of it is new to the chain.';
  } else if (!(x.cannibalization > 0)) {
    first += '; none of it would come from own stores, so all of it is new to the chain.';
  } else {
    const top = [...x.cannibalizedFrom].sort((a, b) => b.demand - a.demand)[0];
    const most = top && x.cannibalizedFrom.length > 1 ? ` (most from ${top.name}: ${demandText(top.demand)})` : top ? ` (all from ${top.name})` : '';
    first += `; ${demandText(x.cannibalization)} of them would come from own stores${most}, so ${demandText(x.netNew)} are new to the chain.`;
  }
  const ringNote = x.measure.startsWith('ring:') ? ` (${demandText(ringValue(x))} ${unit})` : '';
  return `${first} Ranks ${x.rank} of ${x.candidateCount} by ${measureText(x.measure, x.rings, x.radiusUnit)}${ringNote}.`;
}

function ringValue(x: ExplanationInput): number {
  return x.rings[Number(x.measure.slice('ring:'.length))]?.demand ?? 0;
}

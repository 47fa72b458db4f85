const WEIGHT_WORDS = {
  count: 'customers',
  spend: 'spend',
  visits: 'visits',
  other: 'weight',
} as const;

/**
 * What one unit of demand is, in words: the analyst's weight label, else the weight kind's word
 * (a spend-weighted file without a label is "spend", never "customers").
 * @param file the surface's customer file (null when it was deleted)
 * @returns e.g. "annual spend (€)", "spend" or "customers"
 * @example demandUnitWords({ weightLabel: '', weightKind: 'spend' }) // 'spend'
 */
export function demandUnitWords(
  file:
    | { weightLabel?: string | null; weightKind?: keyof typeof WEIGHT_WORDS | null }
    | null
    | undefined,
): string {
  const label = file?.weightLabel?.trim();
  return label ? label : WEIGHT_WORDS[file?.weightKind ?? 'count'];
}

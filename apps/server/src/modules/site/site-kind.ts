import type { SiteKind } from '@demandscape/core';

/** Words accepted for each site kind in imported files (compared case-insensitively, spaces ignored). */
export const SITE_KIND_SYNONYMS: Record<SiteKind, readonly string[]> = {
  candidate: ['candidate', 'cand', 'prospect', 'candidate site', 'proposed'],
  own: ['own', 'own store', 'store', 'ours'],
  competitor: ['competitor', 'rival', 'comp', 'competition', 'competitor store'],
};

const LOOKUP = new Map<string, SiteKind>(
  (Object.entries(SITE_KIND_SYNONYMS) as [SiteKind, readonly string[]][]).flatMap(([kind, words]) => words.map((w) => [kindKey(w), kind] as const)),
);

function kindKey(text: string): string {
  return text.trim().toLowerCase().replace(/[\s_-]+/g, '');
}

/**
 * The site kind a cell names, accepting the synonyms of `SITE_KIND_SYNONYMS` in any case.
 * @param text - the cell text
 * @returns the kind, or null when the text names none
 * @example
 * siteKindParse(' Prospect '); // 'candidate'
 */
export function siteKindParse(text: string): SiteKind | null {
  return LOOKUP.get(kindKey(text)) ?? null;
}

/**
 * What to write instead of an unknown kind, listing every accepted word.
 * @param text - the cell text that named no kind
 * @returns the error message
 * @example
 * siteKindMessage('shop'); // '"shop" is not a site kind; write candidate (or cand, prospect, …), …'
 */
export function siteKindMessage(text: string): string {
  const options = (Object.entries(SITE_KIND_SYNONYMS) as [SiteKind, readonly string[]][])
    .map(([kind, words]) => `${kind} (or ${words.filter((w) => w !== kind).join(', ')})`)
    .join('; ');
  return `"${text.trim()}" is not a site kind; write one of: ${options}`;
}

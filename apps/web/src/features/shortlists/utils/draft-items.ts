import type { ShortlistItemInput } from '../types';

/** A chosen site while the planner builds a shortlist: its place in the list is its order. */
export type DraftItem = { siteId: string; name: string; note: string };

/**
 * Moves one chosen site up or down the list (order is what the executive reads first).
 * @param items the chosen sites in order
 * @param index the site to move
 * @param delta -1 for up, +1 for down
 * @returns a new list; the same list when the move would leave the ends
 * @example draftItemMove([a, b, c], 2, -1) // [a, c, b]
 */
export function draftItemMove(items: DraftItem[], index: number, delta: -1 | 1): DraftItem[] {
  const target = index + delta;
  if (index < 0 || index >= items.length || target < 0 || target >= items.length) return items;
  const next = [...items];
  [next[index], next[target]] = [next[target]!, next[index]!];
  return next;
}

/**
 * Adds a site at the end of the list, or takes it out when it is already chosen.
 * @param items the chosen sites in order
 * @param site the site ticked or unticked in the ranking
 * @returns a new list
 * @example draftItemToggle([], { siteId: 's1', name: 'Quay Street' }) // [{ siteId: 's1', name: 'Quay Street', note: '' }]
 */
export function draftItemToggle(items: DraftItem[], site: { siteId: string; name: string }): DraftItem[] {
  if (items.some((i) => i.siteId === site.siteId)) return items.filter((i) => i.siteId !== site.siteId);
  return [...items, { siteId: site.siteId, name: site.name, note: '' }];
}

/**
 * The ordered `items` of a create or new-version body: notes trimmed, empty notes left out.
 * @param items the chosen sites in order
 * @returns the body's items
 * @example draftItemsBody([{ siteId: 's1', name: 'Quay', note: ' corner lot ' }]) // [{ siteId: 's1', note: 'corner lot' }]
 */
export function draftItemsBody(items: Array<Pick<DraftItem, 'siteId' | 'note'>>): ShortlistItemInput[] {
  return items.map((i) => (i.note.trim() ? { siteId: i.siteId, note: i.note.trim() } : { siteId: i.siteId }));
}

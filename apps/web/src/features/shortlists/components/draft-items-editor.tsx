import { Badge, Button } from '@demandscape/ui';
import { useEffect, useRef } from 'react';
import { draftItemMove, type DraftItem } from '../utils/draft-items';

export type DraftItemsEditorProps = {
  items: DraftItem[];
  onChange: (items: DraftItem[]) => void;
  /** Site ids of the chosen run's candidates; others are flagged and left out when saving. */
  runSiteIds: ReadonlySet<string> | null;
};

/**
 * The chosen sites in the order executives will read them: up/down buttons (keyboard reachable, focus
 * follows the moved site), remove, and a note per site.
 * @param props the chosen sites, the change handler and the run's candidate ids
 * @returns the ordered list, or a hint when nothing is chosen yet
 * @example <DraftItemsEditor items={items} onChange={setItems} runSiteIds={ids} />
 */
export function DraftItemsEditor({ items, onChange, runSiteIds }: DraftItemsEditorProps) {
  const buttons = useRef(new Map<string, HTMLButtonElement>());
  const pendingFocus = useRef<{ siteId: string; dir: 'up' | 'down' } | null>(null);

  // Keep the keyboard on the moved site; at an end its button is disabled, so take the other direction.
  useEffect(() => {
    const pending = pendingFocus.current;
    if (!pending) return;
    pendingFocus.current = null;
    const other = pending.dir === 'up' ? 'down' : 'up';
    const same = buttons.current.get(`${pending.siteId}-${pending.dir}`);
    (same && !same.disabled ? same : buttons.current.get(`${pending.siteId}-${other}`))?.focus();
  }, [items]);

  const buttonRef = (key: string) => (el: HTMLButtonElement | null) => {
    if (el) buttons.current.set(key, el);
    else buttons.current.delete(key);
  };

  if (items.length === 0) {
    return <p className="rounded-control border border-dashed border-line-strong p-4 text-sm text-ink-muted">Tick sites in the ranking to put them on the shortlist.</p>;
  }

  const move = (index: number, delta: -1 | 1) => {
    pendingFocus.current = { siteId: items[index]!.siteId, dir: delta < 0 ? 'up' : 'down' };
    onChange(draftItemMove(items, index, delta));
  };

  return (
    <ol className="flex flex-col gap-2" aria-label="Shortlist order">
      {items.map((item, index) => {
        const missing = runSiteIds !== null && !runSiteIds.has(item.siteId);
        return (
          <li key={item.siteId} className="flex flex-col gap-2 rounded-control border border-line bg-surface p-3 sm:flex-row sm:items-start">
            <div className="flex items-center gap-2 sm:w-64 sm:shrink-0">
              <span className="flex size-7 shrink-0 items-center justify-center rounded-full bg-accent-soft text-sm font-semibold text-accent-strong tabular-nums">
                {index + 1}
              </span>
              <span className="min-w-0 font-medium text-ink">{item.name}</span>
              {missing ? <Badge tone="caution">Not in this run: left out when saved</Badge> : null}
            </div>
            <label className="flex min-w-0 flex-1 flex-col gap-1 text-xs text-ink-muted">
              <span>Note for {item.name}</span>
              <textarea
                className="min-h-14 w-full rounded-control border border-line-strong bg-surface px-3 py-2 text-sm text-ink focus-visible:border-accent"
                value={item.note}
                maxLength={2000}
                placeholder="Why this site, what to check next (optional)"
                onChange={(e) => onChange(items.map((i) => (i.siteId === item.siteId ? { ...i, note: e.target.value } : i)))}
              />
            </label>
            <div className="flex gap-1 sm:flex-col">
              <Button size="sm" variant="secondary" aria-label={`Move ${item.name} up`} ref={buttonRef(`${item.siteId}-up`)} disabled={index === 0} onClick={() => move(index, -1)}>
                ↑ Up
              </Button>
              <Button
                size="sm"
                variant="secondary"
                aria-label={`Move ${item.name} down`}
                ref={buttonRef(`${item.siteId}-down`)}
                disabled={index === items.length - 1}
                onClick={() => move(index, 1)}
              >
                ↓ Down
              </Button>
              <Button size="sm" variant="ghost" aria-label={`Remove ${item.name}`} onClick={() => onChange(items.filter((i) => i.siteId !== item.siteId))}>
                Remove
              </Button>
            </div>
          </li>
        );
      })}
    </ol>
  );
}

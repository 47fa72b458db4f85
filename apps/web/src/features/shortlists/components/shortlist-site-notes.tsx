import type { ShortlistVersion } from '../types';

export type ShortlistSiteNotesProps = { version: Pick<ShortlistVersion, 'items'> };

/**
 * Why each shortlisted site is there: the planner's note and the server's explanation of its score.
 * @param props the shortlist version
 * @returns one block per site, in the planner's order
 * @example <ShortlistSiteNotes version={shortlist.version} />
 */
export function ShortlistSiteNotes({ version }: ShortlistSiteNotesProps) {
  const items = [...version.items].sort((a, b) => a.order - b.order);
  return (
    <ol className="flex flex-col gap-3" aria-label="Notes and explanations per site">
      {items.map((item) => (
        <li key={item.siteId} className="rounded-control border border-line bg-surface p-4">
          <h3 className="flex items-center gap-2 text-sm font-semibold text-ink">
            <span className="flex size-6 items-center justify-center rounded-full bg-accent-soft text-xs text-accent-strong tabular-nums">{item.order}</span>
            {item.name}
            <span className="text-xs font-normal text-ink-muted tabular-nums">
              {item.attractiveness} {item.attractivenessLabel}
            </span>
          </h3>
          <dl className="mt-2 grid gap-2 text-sm sm:grid-cols-[10rem_minmax(0,1fr)]">
            <dt className="text-ink-muted">Planner’s note</dt>
            <dd className="whitespace-pre-line text-ink">{item.note || <span className="text-ink-faint">No note.</span>}</dd>
            <dt className="text-ink-muted">Why it scores so</dt>
            <dd className="text-ink">{item.score.explanation}</dd>
          </dl>
        </li>
      ))}
    </ol>
  );
}

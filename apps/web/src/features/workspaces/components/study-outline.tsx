import { Badge } from '@demandscape/ui';

/** The four steps of a study, in order, with who does each (PRODUCT.md workflow). */
export const studySteps = [
  {
    key: 'customers',
    title: 'Customers',
    summary: 'Upload a customer file: coordinates and a weight such as annual spend. Names and addresses are dropped.',
    by: 'Analysts and owners',
  },
  {
    key: 'surface',
    title: 'Demand surface',
    summary: 'Spread the customers into a continuous surface of demand per km², with a bandwidth you can explain.',
    by: 'Analysts and owners',
  },
  {
    key: 'sites',
    title: 'Sites',
    summary: 'Add candidate sites, your own stores and competitors, and score each candidate’s trade area.',
    by: 'Planners and owners',
  },
  {
    key: 'shortlist',
    title: 'Shortlist',
    summary: 'Rank the candidates and share the shortlist with the people who approve the lease.',
    by: 'Planners and owners',
  },
] as const;

/**
 * The study's four steps and the state of each. Every step is "not started" until its feature
 * exists and has data; nothing here is invented.
 * @returns an ordered list
 * @example <StudyOutline />
 */
export function StudyOutline() {
  return (
    <ol className="flex flex-col gap-1" aria-label="Study steps">
      {studySteps.map((step, index) => (
        <li key={step.key} className="flex gap-3 rounded-control p-3">
          <span
            aria-hidden="true"
            className="flex size-7 shrink-0 items-center justify-center rounded-full border border-line-strong text-xs font-semibold text-ink-muted"
          >
            {index + 1}
          </span>
          <div className="min-w-0 flex-1">
            <div className="flex items-center justify-between gap-2">
              <h3 className="text-sm font-semibold text-ink">{step.title}</h3>
              <Badge>Not started</Badge>
            </div>
            <p className="mt-1 text-xs text-ink-muted">{step.summary}</p>
            <p className="mt-1 text-xs text-ink-faint">{step.by}</p>
          </div>
        </li>
      ))}
    </ol>
  );
}

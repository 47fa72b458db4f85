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
    title: 'Sites & scoring',
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

export type StudyStepKey = (typeof studySteps)[number]['key'];

/** A step's state as the page knows it from its data, e.g. `{ label: 'Imported', tone: 'success' }`. */
export type StudyStepState = { label: string; tone?: 'neutral' | 'accent' | 'success' | 'caution' | 'danger'; detail?: string };

export type StudyOutlineProps = {
  /** States of the steps that have data; the others show "Not started". */
  states?: Partial<Record<StudyStepKey, StudyStepState>>;
  /** The step whose panel is open. */
  activeKey?: StudyStepKey;
  /** Steps that can be opened; without it no step is a button. */
  onSelect?: (key: StudyStepKey) => void;
  /** Which steps `onSelect` applies to (the ones whose features exist). */
  selectable?: readonly StudyStepKey[];
};

/**
 * The study's four steps and the state of each. A step is "not started" until the page reports a
 * state from real data; nothing here is invented.
 * @param props step states, the open step and the handler that opens one
 * @returns an ordered list
 * @example <StudyOutline states={{ customers: { label: 'Imported', tone: 'success' } }} activeKey="customers" onSelect={open} selectable={['customers', 'surface']} />
 */
export function StudyOutline({ states = {}, activeKey, onSelect, selectable = [] }: StudyOutlineProps = {}) {
  return (
    <ol className="flex flex-col gap-1" aria-label="Study steps">
      {studySteps.map((step, index) => {
        const state = states[step.key];
        const canOpen = onSelect !== undefined && selectable.includes(step.key);
        const active = activeKey === step.key;
        // Inside a button only phrasing content is valid, so the step's text is built from spans.
        const Title = canOpen ? 'span' : 'h3';
        const body = (
          <>
            <span
              aria-hidden="true"
              className={`flex size-7 shrink-0 items-center justify-center rounded-full border text-xs font-semibold ${active ? 'border-accent bg-accent text-on-accent' : 'border-line-strong text-ink-muted'}`}
            >
              {index + 1}
            </span>
            <span className="block min-w-0 flex-1">
              <span className="flex items-center justify-between gap-2">
                <Title className="text-sm font-semibold text-ink">{step.title}</Title>
                <Badge tone={state?.tone}>{state?.label ?? 'Not started'}</Badge>
              </span>
              <span className="mt-1 block text-xs text-ink-muted">{state?.detail ?? step.summary}</span>
              <span className="mt-1 block text-xs text-ink-faint">{step.by}</span>
            </span>
          </>
        );
        return (
          <li key={step.key}>
            {canOpen ? (
              <button
                type="button"
                onClick={() => onSelect(step.key)}
                aria-current={active ? 'step' : undefined}
                className={`flex w-full gap-3 rounded-control p-3 text-left hover:bg-sunken ${active ? 'bg-accent-soft' : ''}`}
              >
                {body}
              </button>
            ) : (
              <div className="flex gap-3 rounded-control p-3">{body}</div>
            )}
          </li>
        );
      })}
    </ol>
  );
}

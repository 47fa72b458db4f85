import { Select } from '@demandscape/ui';
import type { MapSurface } from '../types';

export type CompareMode = 'difference' | 'side-by-side';

/**
 * Picks a second surface and how to compare: one map of the difference, or two maps that move together.
 * @param props candidates (succeeded surfaces other than the shown one), the choice, change handlers
 * @returns the controls, or nothing when there is no other surface
 * @example <CompareControls candidates={others} otherId={id} mode="difference" onOther={setId} onMode={setMode} />
 */
export function CompareControls(props: {
  candidates: MapSurface[];
  otherId: string | null;
  mode: CompareMode;
  onOther: (id: string | null) => void;
  onMode: (mode: CompareMode) => void;
}) {
  if (props.candidates.length === 0) return null;
  return (
    <div className="flex flex-wrap items-end gap-2 text-xs">
      <label className="flex flex-col gap-1">
        <span className="font-semibold text-ink">Compare with</span>
        <Select value={props.otherId ?? ''} onChange={(event) => props.onOther(event.target.value || null)} className="min-w-44">
          <option value="">No comparison</option>
          {props.candidates.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </label>
      {props.otherId ? (
        <div role="radiogroup" aria-label="How to compare" className="flex overflow-hidden rounded-control border border-line">
          {(['difference', 'side-by-side'] as const).map((mode) => (
            <button
              key={mode}
              type="button"
              role="radio"
              aria-checked={props.mode === mode}
              onClick={() => props.onMode(mode)}
              className={props.mode === mode ? 'bg-accent px-2.5 py-1.5 text-on-accent' : 'bg-surface px-2.5 py-1.5 text-ink hover:bg-sunken'}
            >
              {mode === 'difference' ? 'Difference' : 'Side by side'}
            </button>
          ))}
        </div>
      ) : null}
    </div>
  );
}

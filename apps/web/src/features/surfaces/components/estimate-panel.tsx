import { Alert, Button, Spinner, Stat } from '@demandscape/ui';
import { ApiError, errorMessage } from '../../../lib/api-error';
import type { SurfaceEstimate } from '../types';
import { metresText, numberText } from '../utils/density-units';

export type EstimatePanelProps = {
  estimate: SurfaceEstimate | undefined;
  error: Error | null;
  /** A request for the current inputs is on its way. */
  isFetching: boolean;
  /** The form is not complete enough to ask (no file, polygon missing, bad number). */
  incomplete: boolean;
  /** Sets the cell size field (the GRID_TOO_LARGE fix). */
  onUseCellSize: (metres: number) => void;
};

/**
 * The live estimate beside the surface form: bandwidth (with Gaussian sd and kernel radius), cell
 * size, grid, credits and warnings; or the engine's refusal with a one-click fix when the grid is too large.
 * @param props the estimate query's state and the fix handler
 * @returns the panel
 * @example <EstimatePanel estimate={q.data} error={q.error} isFetching={q.isFetching} incomplete={!body} onUseCellSize={set} />
 */
export function EstimatePanel({ estimate, error, isFetching, incomplete, onUseCellSize }: EstimatePanelProps) {
  if (incomplete) {
    return <p className="text-sm text-ink-muted">Complete the form to see the bandwidth, grid and cost before anything runs.</p>;
  }
  if (error) {
    const suggested = error instanceof ApiError ? Number(error.details?.suggestedCellSize) : NaN;
    const tooLarge = error instanceof ApiError && error.code === 'GRID_TOO_LARGE';
    return (
      <Alert tone="danger" title={tooLarge ? 'The grid would be too large' : 'These settings cannot run'}>
        <p>{errorMessage(error)}</p>
        {tooLarge && Number.isFinite(suggested) && suggested > 0 ? (
          <Button size="sm" variant="secondary" className="mt-2" onClick={() => onUseCellSize(Math.ceil(suggested))}>
            Use {Math.ceil(suggested).toLocaleString('en')} m
          </Button>
        ) : null}
      </Alert>
    );
  }
  if (!estimate) return <Spinner label="Estimating the run" className="flex justify-center p-4" />;

  const b = estimate.bandwidth;
  return (
    <section aria-label="Estimate" aria-busy={isFetching || undefined} className="flex flex-col gap-3">
      <Stat label="Bandwidth" value={metresText(b.value)} hint={b.explanation} />
      <div className="grid grid-cols-2 gap-2">
        <Stat label="Kernel radius" value={metresText(b.radius)} hint="Customers farther than this add nothing to a cell" />
        <Stat label="Equivalent Gaussian sd" value={metresText(b.gaussianSd)} hint="The same smoothing as a normal curve with this standard deviation" />
        <Stat label="Cell size" value={metresText(estimate.cellSize.value)} hint={estimate.cellSize.explanation} />
        <Stat
          label="Grid"
          value={`${estimate.grid.width.toLocaleString('en')} × ${estimate.grid.height.toLocaleString('en')}`}
          unit="cells"
          hint={`${estimate.grid.cells.toLocaleString('en')} cells in ${estimate.projection.label}`}
        />
      </div>
      <Stat
        label="Cost"
        value={estimate.cost.credits.toLocaleString('en')}
        unit={estimate.cost.credits === 1 ? 'credit' : 'credits'}
        hint={`${estimate.cost.formula}${estimate.estimatedSeconds !== undefined ? ` · about ${numberText(estimate.estimatedSeconds)} s${estimate.method ? ` (${estimate.method} method)` : ''}` : ''}`}
      />
      {estimate.warnings.length ? (
        <Alert tone="caution" title="Before you start">
          <ul className="list-disc pl-4">
            {estimate.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
    </section>
  );
}

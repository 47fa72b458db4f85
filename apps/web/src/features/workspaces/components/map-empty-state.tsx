import { EmptyState } from '@demandscape/ui';

/**
 * What the study's map area shows before there is anything to draw. It says what will appear and who
 * adds it, and draws no made-up data.
 * @returns the empty map panel
 * @example <MapEmptyState />
 */
export function MapEmptyState() {
  return (
    <div
      className="flex h-full min-h-80 items-center justify-center rounded-panel border border-line bg-sunken"
      style={{
        backgroundImage:
          'linear-gradient(var(--color-line) 1px, transparent 1px), linear-gradient(90deg, var(--color-line) 1px, transparent 1px)',
        backgroundSize: '48px 48px',
      }}
    >
      <div className="m-6 max-w-md rounded-panel border border-line bg-surface/95 shadow-panel">
        <EmptyState title="The map is empty until the study has data">
          <p>
            Once an analyst or owner uploads a customer file and builds a demand surface, it appears here as a shaded
            layer with a legend in real units and contours around 50 %, 75 % and 90 % of demand.
          </p>
          <p className="mt-2">Planners and owners then add candidate sites, own stores and competitors on top.</p>
        </EmptyState>
      </div>
    </div>
  );
}

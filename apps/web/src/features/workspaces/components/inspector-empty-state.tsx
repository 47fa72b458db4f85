/**
 * The inspector beside the map before anything can be selected.
 * @returns the empty inspector text
 * @example <InspectorEmptyState />
 */
export function InspectorEmptyState() {
  return (
    <div className="flex flex-col gap-2 p-4 text-sm">
      <h3 className="font-semibold text-ink">Inspector</h3>
      <p className="text-ink-muted">
        Select a site, a contour or a cell on the map to see its numbers here, with units. There is nothing to select yet.
      </p>
    </div>
  );
}

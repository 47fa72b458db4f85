import type { SiteRowError } from '../types';

const fieldWords: Record<string, string> = {
  name: 'name',
  lon: 'longitude',
  lat: 'latitude',
  kind: 'kind',
  attractiveness: 'attractiveness',
  attractivenessLabel: 'attractiveness unit',
  notes: 'notes',
};

/**
 * Every problem of a refused import: file row, field and what is wrong, so the file can be fixed.
 * @param props the rows' errors from 400 SITE_ROWS_INVALID
 * @returns a scrollable table with a one-line summary
 * @example <SiteRowErrors errors={[{ row: 3, field: 'lat', message: 'must be between -90 and 90 degrees (latitude)' }]} />
 */
export function SiteRowErrors({ errors }: { errors: SiteRowError[] }) {
  const rows = new Set(errors.map((e) => e.row)).size;
  return (
    <section aria-label="Rows with errors" className="flex flex-col gap-2">
      <p className="text-sm text-ink">
        Nothing was imported: {rows} {rows === 1 ? 'row has' : 'rows have'} {errors.length === 1 ? 'a problem' : `${errors.length} problems`}. Fix them
        in the file and choose it again, or change the columns above — the file and your choices are kept.
      </p>
      <div className="max-h-64 overflow-auto rounded-control border border-line">
        <table className="min-w-full text-left text-xs">
          <thead className="sticky top-0 bg-sunken">
            <tr>
              <th scope="col" className="px-3 py-1.5 font-medium text-ink">
                Row
              </th>
              <th scope="col" className="px-3 py-1.5 font-medium text-ink">
                Field
              </th>
              <th scope="col" className="px-3 py-1.5 font-medium text-ink">
                Problem
              </th>
            </tr>
          </thead>
          <tbody>
            {errors.map((error, i) => (
              <tr key={`${error.row}-${error.field}-${i}`} className="border-t border-line">
                <td className="px-3 py-1 text-ink tabular-nums">{error.row}</td>
                <td className="px-3 py-1 text-ink">{fieldWords[error.field] ?? error.field}</td>
                <td className="px-3 py-1 text-ink-muted">{error.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}

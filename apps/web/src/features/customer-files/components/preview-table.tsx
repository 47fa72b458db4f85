import { Badge } from '@demandscape/ui';
import type { CustomerFilePreview } from '../types';

export type PreviewTableProps = {
  preview: CustomerFilePreview;
  /** Column names currently chosen for each role ('' = none). */
  mapping: { lon: string; lat: string; weight: string };
};

const roleLabels = { lon: 'longitude', lat: 'latitude', weight: 'weight' } as const;

/**
 * The first rows of an uploaded file, with the columns chosen as longitude, latitude and weight marked
 * in the header and the rest greyed out (they will be discarded).
 * @param props the preview and the current mapping
 * @returns a scrollable table
 * @example <PreviewTable preview={preview} mapping={{ lon: 'x', lat: 'y', weight: '' }} />
 */
export function PreviewTable({ preview, mapping }: PreviewTableProps) {
  const roleOf = (column: string) =>
    (Object.keys(roleLabels) as (keyof typeof roleLabels)[]).find((role) => mapping[role] === column);
  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="min-w-full text-left text-xs tabular-nums">
        <caption className="sr-only">First {preview.rows.length} rows of the file</caption>
        <thead className="bg-sunken">
          <tr>
            {preview.columns.map((column) => {
              const role = roleOf(column);
              return (
                <th key={column} scope="col" className="px-3 py-2 align-bottom font-medium whitespace-nowrap text-ink">
                  {role ? (
                    <Badge tone="accent" className="mb-1 block w-fit">
                      {roleLabels[role]}
                    </Badge>
                  ) : (
                    <span className="mb-1 block text-[0.65rem] font-normal text-ink-faint">discarded</span>
                  )}
                  {column}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((row, r) => (
            <tr key={r} className="border-t border-line">
              {preview.columns.map((column, c) => (
                <td key={column} className={roleOf(column) ? 'px-3 py-1.5 text-ink' : 'px-3 py-1.5 text-ink-faint'}>
                  {row[c] ?? ''}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

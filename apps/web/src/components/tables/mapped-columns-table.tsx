import { Badge } from '@demandscape/ui';

export type MappedColumnsTableProps = {
  columns: string[];
  /** The first rows of the file, one cell per column. */
  rows: string[][];
  /** What a column is used as (e.g. "longitude"), or null when it is not used. */
  roleOf: (column: string) => string | null;
  /** Said above a column that is not used (e.g. "discarded"). */
  unusedLabel: string;
};

/**
 * The first rows of an uploaded file, each used column marked with its role in the header and the
 * others greyed out — shared by the customer-file and the sites import.
 * @param props columns, rows, the role of each column and the word for unused ones
 * @returns a scrollable table
 * @example <MappedColumnsTable columns={['x', 'y']} rows={[['1', '2']]} roleOf={(c) => (c === 'x' ? 'longitude' : null)} unusedLabel="discarded" />
 */
export function MappedColumnsTable({ columns, rows, roleOf, unusedLabel }: MappedColumnsTableProps) {
  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="min-w-full text-left text-xs tabular-nums">
        <caption className="sr-only">First {rows.length} rows of the file</caption>
        <thead className="bg-sunken">
          <tr>
            {columns.map((column) => {
              const role = roleOf(column);
              return (
                <th key={column} scope="col" className="px-3 py-2 align-bottom font-medium whitespace-nowrap text-ink">
                  {role ? (
                    <Badge tone="accent" className="mb-1 block w-fit">
                      {role}
                    </Badge>
                  ) : (
                    <span className="mb-1 block text-[0.65rem] font-normal text-ink-faint">{unusedLabel}</span>
                  )}
                  {column}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, r) => (
            <tr key={r} className="border-t border-line">
              {columns.map((column, c) => (
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

import { MappedColumnsTable } from '../../../components/tables/mapped-columns-table';
import type { CustomerFilePreview } from '../types';

export type PreviewTableProps = {
  preview: CustomerFilePreview;
  /** Column names currently chosen for each role ('' = none). */
  mapping: { lon: string; lat: string; weight: string };
};

const roleLabels = { lon: 'longitude', lat: 'latitude', weight: 'weight' } as const;

/**
 * The first rows of an uploaded customer file, with the columns chosen as longitude, latitude and
 * weight marked in the header and the rest greyed out (they will be discarded).
 * @param props the preview and the current mapping
 * @returns a scrollable table
 * @example <PreviewTable preview={preview} mapping={{ lon: 'x', lat: 'y', weight: '' }} />
 */
export function PreviewTable({ preview, mapping }: PreviewTableProps) {
  const roleOf = (column: string) => {
    const role = (Object.keys(roleLabels) as (keyof typeof roleLabels)[]).find((r) => mapping[r] === column);
    return role ? roleLabels[role] : null;
  };
  return <MappedColumnsTable columns={preview.columns} rows={preview.rows} roleOf={roleOf} unusedLabel="discarded" />;
}

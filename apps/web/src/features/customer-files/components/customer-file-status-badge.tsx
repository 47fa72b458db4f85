import { Badge } from '@demandscape/ui';
import type { CustomerFileStatus } from '../types';

const look: Record<CustomerFileStatus, { text: string; tone: 'neutral' | 'accent' | 'success' | 'danger' | 'caution' }> = {
  'awaiting-mapping': { text: 'Columns to check', tone: 'caution' },
  importing: { text: 'Importing', tone: 'accent' },
  imported: { text: 'Imported', tone: 'success' },
  failed: { text: 'Import failed', tone: 'danger' },
};

/**
 * A customer file's status in words.
 * @param props the status
 * @returns the badge
 * @example <CustomerFileStatusBadge status="imported" />
 */
export function CustomerFileStatusBadge({ status }: { status: CustomerFileStatus }) {
  const { text, tone } = look[status] ?? { text: status, tone: 'neutral' };
  return <Badge tone={tone}>{text}</Badge>;
}

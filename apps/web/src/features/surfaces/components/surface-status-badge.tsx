import { Badge } from '@demandscape/ui';
import type { SurfaceStatus } from '../types';

const look: Record<SurfaceStatus, { text: string; tone: 'neutral' | 'accent' | 'success' | 'danger' | 'caution' }> = {
  queued: { text: 'Queued', tone: 'neutral' },
  running: { text: 'Running', tone: 'accent' },
  succeeded: { text: 'Ready', tone: 'success' },
  failed: { text: 'Failed', tone: 'danger' },
  cancelled: { text: 'Cancelled', tone: 'caution' },
};

/**
 * A run's status in words.
 * @param props the status
 * @returns the badge
 * @example <SurfaceStatusBadge status="running" />
 */
export function SurfaceStatusBadge({ status }: { status: SurfaceStatus }) {
  const { text, tone } = look[status] ?? { text: status, tone: 'neutral' };
  return <Badge tone={tone}>{text}</Badge>;
}

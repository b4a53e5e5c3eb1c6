import { buildStatusLabels, type BuildStatus } from '@shared/schemas/build-vocabulary.ts';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { buildStatusTone } from './format.ts';

/** Draft / Pending review / Published / Returned with notes / Declined. */
export function BuildStatusBadge({ status }: { status: BuildStatus }) {
  return <StatusBadge tone={buildStatusTone[status]}>{buildStatusLabels[status]}</StatusBadge>;
}

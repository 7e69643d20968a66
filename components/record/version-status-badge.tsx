import { StatusBadge } from '@/components/ui/status-badge';
import type { PlanVersionStatus } from '@/shared/schemas/plan';

const look = {
  draft: { tone: 'neutral', icon: 'create-outline', label: 'Draft' },
  active: { tone: 'success', icon: 'play-circle-outline', label: 'Active' },
  superseded: { tone: 'neutral', icon: 'archive-outline', label: 'Replaced' },
} as const;

export function VersionStatusBadge({ status }: { status: PlanVersionStatus }) {
  const { tone, icon, label } = look[status];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={`version-status-${status}`} />;
}

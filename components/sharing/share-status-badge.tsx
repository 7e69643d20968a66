import { StatusBadge } from '@/components/ui/status-badge';
import type { Share } from '@/shared/schemas/share';

const look = {
  active: { tone: 'success', icon: 'eye-outline', label: 'Sees your clearance' },
  invited: { tone: 'neutral', icon: 'mail-outline', label: 'Invitation sent' },
} as const;

export function ShareStatusBadge({ status }: { status: Share['status'] }) {
  const { tone, icon, label } = look[status];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={`share-status-${status}`} />;
}

import { StatusBadge } from '@/components/ui/status-badge';
import type { InvitationStatus } from '@/shared/schemas/invitation';

const look = {
  pending: { tone: 'warning', icon: 'hourglass-outline', label: 'Awaiting reply' },
  accepted: { tone: 'success', icon: 'checkmark-circle', label: 'Accepted' },
  expired: { tone: 'danger', icon: 'close-circle-outline', label: 'Expired' },
} as const;

export function InvitationStatusBadge({ status }: { status: InvitationStatus }) {
  const { tone, icon, label } = look[status];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={`invitation-status-${status}`} />;
}

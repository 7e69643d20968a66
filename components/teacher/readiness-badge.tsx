import { StatusBadge } from '@/components/ui/status-badge';
import type { Readiness } from '@/shared/schemas/clearance';

// Plain words only: a teacher learns that things are slower or stopped, never why.
const look = {
  on_track: { tone: 'success', icon: 'checkmark-circle-outline', label: 'On track' },
  delayed: { tone: 'warning', icon: 'time-outline', label: 'Delayed' },
  paused: { tone: 'danger', icon: 'pause-circle-outline', label: 'Paused' },
} as const;

export function ReadinessBadge({ readiness, testID }: { readiness: Readiness; testID?: string }) {
  const { tone, icon, label } = look[readiness];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={testID ?? `readiness-${readiness}`} />;
}

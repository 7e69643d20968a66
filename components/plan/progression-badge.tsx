import { StatusBadge } from '@/components/ui/status-badge';
import type { PlanOverview } from '@/shared/schemas/plan-overview';

const look = {
  on_track: { tone: 'success', icon: 'arrow-up-circle-outline', label: 'On schedule' },
  held: { tone: 'warning', icon: 'pause-circle-outline', label: 'Holding at this stage' },
  stepped_back: { tone: 'warning', icon: 'arrow-down-circle-outline', label: 'Stepped back a stage' },
  stopped: { tone: 'danger', icon: 'stop-circle-outline', label: 'Playing stopped' },
  complete: { tone: 'success', icon: 'checkmark-done-circle-outline', label: 'Target reached' },
} as const;

/** Where the plan stands, in words with an icon; a red flag overrides everything else. */
export function ProgressionBadge({ plan, testID }: { plan: PlanOverview; testID?: string }) {
  if (plan.redFlagActive) {
    return <StatusBadge tone="danger" icon="alert-circle" label="Red flag: needs review" testID={testID} />;
  }
  const { tone, icon, label } = look[plan.status];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={testID} />;
}

import { StatusBadge } from '@/components/ui/status-badge';
import type { CaseloadStatus } from '@/shared/schemas/musician';

const look = {
  on_track: { tone: 'success', icon: 'arrow-up-circle-outline', label: 'On track' },
  held: { tone: 'warning', icon: 'pause-circle-outline', label: 'Held' },
  stepped_back: { tone: 'warning', icon: 'arrow-down-circle-outline', label: 'Stepped back' },
  stopped: { tone: 'danger', icon: 'stop-circle-outline', label: 'Stopped' },
  complete: { tone: 'success', icon: 'checkmark-done-circle-outline', label: 'Target reached' },
  no_plan: { tone: 'neutral', icon: 'document-outline', label: 'No active plan' },
} as const;

export const caseloadStatusWords: Record<CaseloadStatus, string> = {
  on_track: look.on_track.label,
  held: look.held.label,
  stepped_back: look.stepped_back.label,
  stopped: look.stopped.label,
  complete: look.complete.label,
  no_plan: look.no_plan.label,
};

/** The progression status in words with an icon, so it never rests on colour alone. */
export function CaseloadStatusBadge({ status }: { status: CaseloadStatus }) {
  const { tone, icon, label } = look[status];
  return <StatusBadge tone={tone} icon={icon} label={label} testID={`caseload-status-${status}`} />;
}

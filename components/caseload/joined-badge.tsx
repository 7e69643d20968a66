import { StatusBadge } from '@/components/ui/status-badge';
import type { CaseloadEntry } from '@/shared/schemas/musician';

/** "Joined" once the musician has set a password; until then the invitation is still out. */
export function JoinedBadge({ entry }: { entry: CaseloadEntry }) {
  return entry.joined ? (
    <StatusBadge tone="success" icon="checkmark-circle" label="Joined" />
  ) : (
    <StatusBadge tone="warning" icon="paper-plane-outline" label="Invitation sent" />
  );
}

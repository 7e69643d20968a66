import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { StatusBadge } from '@/components/ui/status-badge';
import type { PieceClearance } from '@/shared/schemas/repertoire';

/** Cleared now, or from which stage and when it is expected; derived from the plan, never typed. */
export function ClearanceBadge({ clearance }: { clearance: PieceClearance | null }) {
  if (!clearance) return <StatusBadge tone="neutral" icon="help-circle-outline" label="No active plan" />;
  if (clearance.cleared) {
    return clearance.passagesFromStage !== null && !clearance.passagesCleared ? (
      <StatusBadge tone="warning" icon="checkmark-outline" label={`Cleared; passages from stage ${clearance.passagesFromStage}`} testID="clearance-partial" />
    ) : (
      <StatusBadge tone="success" icon="checkmark-circle" label="Cleared" testID="clearance-cleared" />
    );
  }
  const when = clearance.expectedOn ? `, expected ${format(parseISO(clearance.expectedOn), 'd MMM')}` : '';
  return <StatusBadge tone="neutral" icon="lock-closed-outline" label={`From stage ${clearance.clearedFromStage}${when}`} testID="clearance-later" />;
}

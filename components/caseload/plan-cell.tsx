import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { AppText } from '@/components/ui/text';
import { ProgressionBadge } from '@/components/plan/progression-badge';

/** A musician's plan in one glance for the caseload: stage, state, and whether the event is in reach. */
export function PlanCell({ entry }: { entry: CaseloadEntry }) {
  const plan = entry.plan;
  if (!plan) {
    return (
      <AppText tone="muted" testID="plan-cell-none">
        No plan yet
      </AppText>
    );
  }
  return (
    <View style={styles.cell}>
      <ProgressionBadge plan={plan} />
      <AppText variant="caption" tone="muted">
        {`Stage ${plan.stageNumber} of ${plan.stageCount} · ${plan.minutesPerDay} min a day`}
      </AppText>
      {plan.feasible ? null : (
        <AppText variant="caption" tone="warning">{`Target ${plan.daysShort} days after ${plan.event.name}`}</AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ cell: { gap: spacing.xxs } });

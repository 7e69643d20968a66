import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { AppText } from '@/components/ui/text';
import { CaseloadStatusBadge } from './caseload-status-badge';

/** A musician's plan in one glance for the caseload: stage and status in words. */
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
      <CaseloadStatusBadge status={entry.status} />
      <AppText variant="caption" tone="muted">
        {`Stage ${plan.stageNumber} of ${plan.stageCount} · ${plan.minutesPerDay} min a day`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({ cell: { gap: spacing.xxs } });

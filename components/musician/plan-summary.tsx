import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { MusicianHome } from '@/shared/schemas/musician';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { PlanFacts } from '@/components/plan/plan-facts';
import { ProgressionBadge } from '@/components/plan/progression-badge';

export interface PlanSummaryProps {
  plan: MusicianHome['plan'];
  clinicianName: string;
}

/** The musician's plan at a glance, or a clear word that it is still being prepared. */
export function PlanSummary({ plan, clinicianName }: PlanSummaryProps) {
  const { colors } = useTheme();
  if (plan === null) {
    return (
      <Card testID="plan-summary-empty">
        <View style={styles.row}>
          <Icon name="calendar-outline" size={24} color={colors.accent} />
          <AppText variant="heading" style={styles.flex}>
            No plan yet — your clinician will prepare one
          </AppText>
        </View>
        <AppText>
          {`${clinicianName} will set out how many minutes you may play each day and which pieces are cleared. It will appear here, with today’s session.`}
        </AppText>
        <AppText tone="muted">
          Until then, keep to the advice you were given at your appointment and do not add playing time on your own.
        </AppText>
      </Card>
    );
  }
  return (
    <Card testID="plan-summary">
      {plan.redFlagActive ? (
        <Banner tone="danger" title="Do not play until your clinician has reviewed you">
          {`You reported a warning sign. ${clinicianName} has been alerted; contact them if you have not heard back today.`}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <AppText variant="heading" style={styles.flex}>{`Stage ${plan.stageNumber} of ${plan.stageCount}`}</AppText>
        <ProgressionBadge plan={plan} testID="plan-status" />
      </View>
      <PlanFacts plan={plan} />
      {plan.lastChange ? <AppText tone="muted">{plan.lastChange}</AppText> : null}
      {plan.nextStageStartDate && plan.status === 'on_track' ? (
        <AppText variant="caption" tone="muted">
          {`Next stage from ${format(parseISO(plan.nextStageStartDate), 'EEEE d MMMM')} if your checks stay clear.`}
        </AppText>
      ) : null}
      {!plan.feasible ? (
        <Banner tone="warning" title="The full programme will not be ready in time">
          {`At a safe pace you reach your target on ${format(parseISO(plan.targetReachedOn), 'd MMMM')}. Your clinician will talk through the options with you.`}
        </Banner>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'center', flexWrap: 'wrap' },
  flex: { flex: 1, minWidth: 160 },
});

import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useMyPlanQuery } from '@/hooks/use-my-plan';
import { isApiError } from '@/lib/api-client';
import { Card } from '@/components/ui/card';
import { CautionCard } from '@/components/ui/caution-card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { AppText } from '@/components/ui/text';
import { ProgressionBadge } from '@/components/plan/progression-badge';
import { SetupReminders } from '@/components/today/setup-reminders';
import { CalendarCard } from './calendar-card';
import { DocumentsCard } from './documents-card';
import { NextUnlockCard } from './next-unlock-card';
import { PlanPieces } from './plan-pieces';
import { StageList } from './stage-list';
import { StageTimeline } from './stage-timeline';

/** The musician's plan: the stages to the event, where they stand, what unlocks next, and the rest. */
export function MyPlanView() {
  const { isWide } = useBreakpoints();
  const plan = useMyPlanQuery();
  const data = plan.data;
  const noPlan = isApiError(plan.error) && plan.error.status === 404;
  return (
    <Screen
      testID="screen-my-plan"
      title="My plan"
      lead={data ? `${data.event.name} on ${format(parseISO(data.event.date), 'EEEE d MMMM')}: in ${Math.max(0, data.overview.daysToEvent)} days` : undefined}
      footer={<CautionCard audience="musician" />}
    >
      {plan.isPending ? <LoadingState label="Loading your plan…" /> : null}
      {noPlan ? <EmptyState icon="calendar-outline" title="No plan yet" testID="my-plan-empty">Your clinician will prepare your plan; it will appear here.</EmptyState> : null}
      {plan.isError && !noPlan ? <ErrorState error={plan.error} onRetry={() => plan.refetch()} testID="my-plan-error" /> : null}
      {data ? (
        <View style={[styles.grid, isWide && styles.gridWide]}>
          <View style={[styles.column, isWide && styles.main]}>
            <Card testID="plan-timeline">
              <View style={styles.head}>
                <AppText variant="heading" style={styles.flex}>Stages to the event</AppText>
                <ProgressionBadge plan={data.overview} testID="my-plan-status" />
              </View>
              <StageTimeline stages={data.stages} today={data.overview.today} event={data.event} />
              <AppText variant="caption" tone="muted">Solid: played. Dashed: expected if your checks stay clear. Height: minutes a day.</AppText>
              {data.overview.lastChange ? <AppText>{data.overview.lastChange}</AppText> : null}
              <StageList stages={data.stages} eventDate={data.event.date} />
            </Card>
          </View>
          <View style={[styles.column, isWide && styles.side]}>
            <NextUnlockCard plan={data} />
            <PlanPieces pieces={data.pieces} />
            <SetupReminders items={data.setup} />
            <DocumentsCard />
            <CalendarCard />
          </View>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  grid: { gap: spacing.lg },
  gridWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: spacing.lg },
  main: { flex: 3 },
  side: { flex: 2 },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  flex: { flex: 1 },
});

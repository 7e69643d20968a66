import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { usePlanStateQuery } from '@/hooks/use-plans';
import { PlanFacts } from '@/components/plan/plan-facts';
import { ProgressionBadge } from '@/components/plan/progression-badge';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';

/** The active plan now: stage, status, today's allowance, prompts for the clinician. */
export function PlanStatusCard({ id }: { id: string }) {
  const state = usePlanStateQuery(id);
  if (state.isPending) return <LoadingState label="Loading the plan…" />;
  if (state.isError) return <ErrorState error={state.error} onRetry={() => state.refetch()} testID="plan-state-error" />;
  if (!state.data) {
    return (
      <Section title="Plan" testID="plan-status">
        <AppText tone="muted" testID="plan-status-none">
          No active plan yet. Build one under the Plan tab; the musician is e-mailed when you activate it.
        </AppText>
      </Section>
    );
  }
  const { overview, prompts, feasibility, cleanDays } = state.data;
  return (
    <Section title={`Plan, version ${overview.version}`} testID="plan-status">
      <Card>
        <View style={styles.head}>
          <ProgressionBadge plan={overview} testID="record-progression" />
          <AppText variant="caption" tone="muted">
            {`Stage ${overview.stageNumber} of ${overview.stageCount} · ${cleanDays} clean day${cleanDays === 1 ? '' : 's'} at this stage`}
          </AppText>
        </View>
        {overview.lastChange ? <AppText variant="caption">{overview.lastChange}</AppText> : null}
        <PlanFacts plan={overview} />
      </Card>
      {feasibility.feasible ? null : (
        <Banner tone="warning" title="The event is out of reach on this plan" testID="record-infeasible">
          {feasibility.message}
        </Banner>
      )}
      {prompts.map((prompt) => (
        <Banner key={prompt} tone="info" testID="plan-prompt">
          {prompt}
        </Banner>
      ))}
    </Section>
  );
}

const styles = StyleSheet.create({ head: { gap: spacing.xs } });

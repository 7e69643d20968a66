import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { PlanOverview } from '@/shared/schemas/plan-overview';
import { AppText } from '@/components/ui/text';

const tierLabel = { easy: 'Easy pieces', moderate: 'Up to moderate pieces', demanding: 'All pieces, demanding included' } as const;

interface Fact {
  icon: IconName;
  label: string;
  value: string;
}

/** Today's allowance from the current stage, as a small grid of labelled values. */
export function PlanFacts({ plan }: { plan: PlanOverview }) {
  const { colors } = useTheme();
  const facts: Fact[] = [
    { icon: 'time-outline', label: 'Playing today', value: `${plan.minutesPerDay} min in ${plan.sessionsPerDay} session${plan.sessionsPerDay === 1 ? '' : 's'}` },
    { icon: 'hourglass-outline', label: 'Longest block', value: `${plan.longestBlockMinutes} min, then ${plan.restMinutes} min rest` },
    { icon: 'musical-notes-outline', label: 'Repertoire', value: plan.highestTier ? tierLabel[plan.highestTier] : 'Technical exercises only' },
    { icon: 'flag-outline', label: plan.event.name, value: plan.daysToEvent >= 0 ? `in ${plan.daysToEvent} days` : 'has passed' },
  ];
  return (
    <View style={styles.grid}>
      {facts.map((fact) => (
        <View key={fact.label} style={[styles.fact, { backgroundColor: colors.surfaceMuted }]}>
          <View style={styles.head}>
            <Icon name={fact.icon} size={16} color={colors.accent} />
            <AppText variant="label" tone="muted">
              {fact.label}
            </AppText>
          </View>
          <AppText variant="bodyStrong">{fact.value}</AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  fact: { flexGrow: 1, flexBasis: 150, padding: spacing.md, borderRadius: radii.md, gap: spacing.xxs },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { radii, spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useTheme } from '@/hooks/use-theme';
import type { StudentClearance } from '@/shared/schemas/clearance';
import { Banner } from '@/components/ui/banner';
import { AppText } from '@/components/ui/text';

interface Fact {
  key: string;
  icon: IconName;
  label: string;
  value: string;
  detail?: string;
}

function factsOf({ limits }: StudentClearance): Fact[] {
  return [
    {
      key: 'block',
      icon: 'timer-outline',
      label: 'Longest continuous playing',
      value: `${limits.longestBlockMinutes} min`,
      detail: limits.restMinutes > 0 ? `then a break of at least ${limits.restMinutes} min` : undefined,
    },
    { key: 'day', icon: 'today-outline', label: 'Most playing in a day', value: `${limits.minutesPerDay} min` },
    { key: 'sessions', icon: 'repeat-outline', label: 'Sessions a day', value: String(limits.sessionsPerDay) },
  ];
}

/** How much playing is allowed now; while paused, only that there is no playing, never why. */
export function ClearanceLimits({ clearance }: { clearance: StudentClearance }) {
  const { colors } = useTheme();
  const { isMedium } = useBreakpoints();
  if (clearance.readiness === 'paused') {
    return (
      <Banner tone="danger" title="No playing for now" testID="clearance-paused">
        Nothing is cleared at the moment. You will get an e-mail when that changes.
      </Banner>
    );
  }
  return (
    <View style={isMedium ? styles.grid : styles.stack} testID="clearance-limits">
      {factsOf(clearance).map((fact) => (
        <View
          key={fact.key}
          testID={`limit-${fact.key}`}
          style={[styles.fact, !isMedium && styles.factCompact, { backgroundColor: colors.surface, borderColor: colors.border }]}
        >
          <View style={styles.labelRow}>
            <Icon name={fact.icon} size={18} color={colors.primary} />
            <AppText variant="label" tone="muted">
              {fact.label}
            </AppText>
          </View>
          <AppText variant={isMedium ? 'title' : 'heading'}>{fact.value}</AppText>
          {fact.detail ? (
            <AppText variant="caption" tone="muted">
              {fact.detail}
            </AppText>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  fact: { flexGrow: 1, flexBasis: 200, borderWidth: 1, borderRadius: radii.lg, padding: spacing.lg, gap: spacing.xs },
  stack: { gap: spacing.sm },
  factCompact: { flexBasis: 'auto', padding: spacing.md, gap: spacing.xxs },
  labelRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

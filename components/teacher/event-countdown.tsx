import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { daysToGo, formatPlanDate } from '@/lib/plan-dates';
import type { StudentSummary } from '@/shared/schemas/clearance';
import { AppText } from '@/components/ui/text';

export interface EventCountdownProps {
  event: StudentSummary['event'];
  asOf: string;
  testID?: string;
}

/** The event a student is working towards, its date and how many days are left. */
export function EventCountdown({ event, asOf, testID }: EventCountdownProps) {
  const { colors } = useTheme();
  if (!event) {
    return (
      <AppText variant="caption" tone="muted" testID={testID}>
        No event set
      </AppText>
    );
  }
  return (
    <View style={styles.row} testID={testID}>
      <Icon name="calendar-outline" size={16} color={colors.textMuted} style={styles.icon} />
      <View style={styles.text}>
        <AppText variant="bodyStrong">{event.name}</AppText>
        <AppText variant="caption" tone="muted">
          {`${formatPlanDate(event.date)} · ${daysToGo(asOf, event.date)}`}
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.xs, alignItems: 'flex-start' },
  icon: { marginTop: 4 },
  text: { flexShrink: 1 },
});

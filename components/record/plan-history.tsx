import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { HistoryEventView, OverrideRecord } from '@/shared/schemas/plan';
import { AppText } from '@/components/ui/text';

const day = (date: string) => format(parseISO(date), 'EEE d MMM');

/** The engine's explained history of the progression, newest first. */
export function PlanHistory({ events }: { events: readonly HistoryEventView[] }) {
  const { colors } = useTheme();
  if (events.length === 0) return <AppText tone="muted" testID="plan-history-empty">No changes yet: the plan has run as built.</AppText>;
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="plan-history">
      {[...events].reverse().map((event, position) => (
        <View key={`${event.date}-${event.kind}-${event.fromStage}-${event.toStage}`} style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]} testID="plan-history-row">
          <AppText variant="label">{`${day(event.date)} · stage ${event.fromStage}${event.toStage !== event.fromStage ? ` → ${event.toStage}` : ''}`}</AppText>
          <AppText variant="caption">{event.message}</AppText>
          {event.by ? <AppText variant="caption" tone="muted">{`By ${event.by}`}</AppText> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: spacing.md, gap: spacing.xxs },
});

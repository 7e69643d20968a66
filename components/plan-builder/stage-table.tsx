import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { tierWords } from '@/lib/repertoire-words';
import type { Stage } from '@/shared/scheduler';
import { AppText } from '@/components/ui/text';

const day = (date: string) => format(parseISO(date), 'd MMM');

/** The stages as built: dates, minutes, sessions, block and rest, repertoire, and where each comes from. */
export function StageTable({ stages, eventDate }: { stages: readonly Stage[]; eventDate: string }) {
  const { colors } = useTheme();
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="preview-stage-table" accessibilityLabel="Stages of the plan">
      {stages.map((stage, position) => {
        const late = stage.startDate > eventDate;
        return (
          <View key={stage.index} style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]} testID="preview-stage-row">
            <View style={styles.head}>
              <AppText variant="bodyStrong">{`Stage ${stage.number}`}</AppText>
              <AppText variant="caption" tone={late ? 'danger' : 'muted'}>
                {`${day(stage.startDate)} – ${day(stage.endDate)}${late ? ' · after the event' : ''}`}
              </AppText>
            </View>
            <AppText variant="caption">
              {`${stage.minutesPerDay} min a day in ${stage.sessionsPerDay} session${stage.sessionsPerDay === 1 ? '' : 's'} · play ${stage.blockMinutes}, rest ${stage.restMinutes}`}
            </AppText>
            <AppText variant="caption" tone="muted">
              {`${stage.highestTier ? `${tierWords[stage.highestTier]} pieces` : 'Exercises only'}${stage.passagesCleared ? ', demanding passages in bursts' : ''} · ${stage.basis === 'published' ? 'published level' : 'our progression rule'}`}
            </AppText>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { paddingHorizontal: spacing.md, paddingVertical: spacing.sm, gap: spacing.xxs },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm },
});

import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { MyPlanStage } from '@/shared/schemas/my-plan';
import { StatusBadge } from '@/components/ui/status-badge';
import { AppText } from '@/components/ui/text';
import { tierWords } from '@/components/today/step-words';

const day = (date: string) => format(parseISO(date), 'd MMM');

/** The stages in words: dates, minutes, blocks and rests, and where the numbers come from. */
export function StageList({ stages, eventDate }: { stages: MyPlanStage[]; eventDate: string }) {
  const { colors } = useTheme();
  return (
    <View style={styles.list} testID="stage-list">
      {stages
        .filter((stage) => stage.startDate <= eventDate)
        .map((stage) => (
          <View
            key={`${stage.stageNumber}-${stage.startDate}`}
            style={[styles.row, { borderColor: stage.current ? colors.primary : colors.border, backgroundColor: stage.current ? colors.surface : 'transparent' }]}
          >
            <View style={styles.head}>
              <AppText variant="bodyStrong" style={styles.flex}>
                {`Stage ${stage.stageNumber} · ${day(stage.startDate)} – ${day(stage.endDate < eventDate ? stage.endDate : eventDate)}`}
              </AppText>
              {stage.current ? <StatusBadge tone="success" icon="location" label="You are here" /> : null}
              {!stage.current && stage.kind === 'projected' ? <StatusBadge tone="neutral" icon="time-outline" label="Expected" /> : null}
            </View>
            <AppText variant="caption">
              {`${stage.minutesPerDay} min a day · blocks up to ${stage.blockMinutes} min, ${stage.restMinutes} min rest · ${tierWords(stage.highestTier)}${stage.passagesCleared ? ', passages in bursts' : ''}`}
            </AppText>
            <AppText variant="caption" tone="muted">
              {stage.basis === 'published' ? 'Published return-to-play level (BAPAM)' : 'Ritorno progression rule, set by your clinician'}
            </AppText>
          </View>
        ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: { borderWidth: 1, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  flex: { flexGrow: 1 },
});

import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { StudentClearance } from '@/shared/schemas/clearance';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { EventCountdown } from './event-countdown';
import { ReadinessBadge } from './readiness-badge';

const readinessLine = {
  on_track: 'Progressing as planned.',
  delayed: 'Progress is slower than planned; projected dates may move.',
  paused: 'Playing is paused for now.',
} as const;

/** Instrument, event and readiness of the student, at a glance. */
export function StudentHeader({ clearance }: { clearance: StudentClearance }) {
  const { colors } = useTheme();
  return (
    <Card testID="student-header" style={styles.card}>
      <View style={styles.block}>
        <View style={styles.line}>
          <Icon name="musical-note-outline" size={16} color={colors.textMuted} />
          <AppText>{clearance.instrument}</AppText>
        </View>
        <EventCountdown event={clearance.event} asOf={clearance.asOf} />
      </View>
      <View style={styles.block}>
        <ReadinessBadge readiness={clearance.readiness} />
        <AppText variant="caption" tone="muted">
          {readinessLine[clearance.readiness]}
        </AppText>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg, justifyContent: 'space-between' },
  block: { gap: spacing.sm, minWidth: 220, flexShrink: 1 },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

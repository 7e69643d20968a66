import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { Link } from 'expo-router';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { StudentSummary } from '@/shared/schemas/clearance';
import { AppText } from '@/components/ui/text';
import { EventCountdown } from './event-countdown';
import { ReadinessBadge } from './readiness-badge';

const readinessWords = { on_track: 'on track', delayed: 'delayed', paused: 'paused' } as const;

/** One student on a phone: the whole card opens their clearance. */
export function StudentCard({ student }: { student: StudentSummary }) {
  const { colors } = useTheme();
  return (
    <Link href={`/students/${student.id}`} asChild>
      <Pressable
        testID={`student-open-${student.id}`}
        accessibilityRole="link"
        accessibilityLabel={`${student.name}, ${student.instrument}, ${readinessWords[student.readiness]}. Open their playing clearance`}
        // One flat style object: on the web Link's asChild hands the style straight to the anchor element.
        style={StyleSheet.flatten([styles.card, { backgroundColor: colors.surface, borderColor: colors.border }])}
      >
        <View testID="student-row" style={styles.body}>
          <View style={styles.head}>
            <View style={styles.names}>
              <AppText variant="heading">{student.name}</AppText>
              <View style={styles.line}>
                <Icon name="musical-note-outline" size={16} color={colors.textMuted} />
                <AppText tone="muted">{student.instrument}</AppText>
              </View>
            </View>
            <Icon name="chevron-forward" size={22} color={colors.textMuted} />
          </View>
          <ReadinessBadge readiness={student.readiness} />
          <EventCountdown event={student.event} asOf={student.asOf} />
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radii.lg, padding: spacing.lg, minHeight: touchTarget },
  body: { gap: spacing.sm },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  names: { gap: spacing.xxs, flexShrink: 1 },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

import { StyleSheet, View } from 'react-native';
import Ionicons from '@expo/vector-icons/Ionicons';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { MusicianHome } from '@/shared/schemas/musician';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';

export interface PlanSummaryProps {
  plan: MusicianHome['plan'];
  clinicianName: string;
}

/**
 * The musician's plan at a glance. Only the "no plan yet" state exists so far; the stage, today's
 * minutes and the event countdown belong here once plans reach the API.
 */
export function PlanSummary({ plan, clinicianName }: PlanSummaryProps) {
  const { colors } = useTheme();
  if (plan === null) {
    return (
      <Card testID="plan-summary-empty">
        <View style={styles.row}>
          <Ionicons name="calendar-outline" size={24} color={colors.accent} />
          <AppText variant="heading" style={styles.title}>
            No plan yet — your clinician will prepare one
          </AppText>
        </View>
        <AppText>
          {`${clinicianName} will set out how many minutes you may play each day and which pieces are cleared. It will appear here, with today’s session.`}
        </AppText>
        <AppText tone="muted">
          Until then, keep to the advice you were given at your appointment and do not add playing time on your own.
        </AppText>
      </Card>
    );
  }
  return null;
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'center' },
  title: { flex: 1 },
});

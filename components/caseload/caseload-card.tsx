import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns';
import Ionicons from '@expo/vector-icons/Ionicons';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { JoinedBadge } from './joined-badge';
import { PlanCell } from './plan-cell';

export function CaseloadCard({ entry }: { entry: CaseloadEntry }) {
  const { colors } = useTheme();
  return (
    <Card testID="caseload-entry">
      <View style={styles.names}>
        <AppText variant="heading">{entry.name}</AppText>
        <View style={styles.instrument}>
          <Ionicons name="musical-note-outline" size={16} color={colors.textMuted} />
          <AppText tone="muted">{entry.instrument}</AppText>
        </View>
      </View>
      <AppText variant="caption" tone="muted" numberOfLines={1}>
        {`${entry.email} · added ${format(new Date(entry.createdAt), 'd MMM yyyy')}`}
      </AppText>
      <View style={styles.badges}>
        <JoinedBadge entry={entry} />
      </View>
      <PlanCell entry={entry} />
    </Card>
  );
}

const styles = StyleSheet.create({
  names: { gap: spacing.xxs, flexShrink: 1 },
  badges: { flexDirection: 'row', gap: spacing.sm },
  instrument: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

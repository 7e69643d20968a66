import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { SetupReminder } from '@/shared/schemas/today';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';

/** The playing-setup changes the clinician prescribed, as reminders before playing. */
export function SetupReminders({ items }: { items: SetupReminder[] }) {
  const { colors } = useTheme();
  if (items.length === 0) return null;
  return (
    <Card testID="setup-reminders">
      <AppText variant="heading">Your setup</AppText>
      {items.map((item) => (
        <View key={item.id} style={styles.row}>
          <Icon name="construct-outline" size={18} color={colors.accent} style={styles.icon} />
          <View style={styles.text}>
            <AppText variant="bodyStrong">{item.label}</AppText>
            {item.instructions ? <AppText variant="caption" tone="muted">{item.instructions}</AppText> : null}
          </View>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.sm },
  icon: { marginTop: 2 },
  text: { flex: 1, gap: spacing.xxs },
});

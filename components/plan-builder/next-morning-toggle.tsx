import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { useController, type Control } from 'react-hook-form';
import { spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { PlanSettings } from '@/shared/schemas/plan-settings';
import { AppText } from '@/components/ui/text';
import type { PlanFormValues } from './plan-form';

/** Whether a playing day counts only once the next morning is free of symptoms too (BAPAM: yes). */
export function NextMorningToggle({ control }: { control: Control<PlanFormValues, unknown, PlanSettings> }) {
  const { colors } = useTheme();
  const { field } = useController({ control, name: 'requireNextMorningCheck' });
  const on = field.value;
  return (
    <Pressable
      testID="plan-requireNextMorningCheck"
      accessibilityRole="checkbox"
      accessibilityLabel="Count a day only after a symptom-free next morning"
      aria-checked={on}
      onPress={() => field.onChange(!on)}
      style={styles.row}
    >
      <Icon name={on ? 'checkbox' : 'square-outline'} size={24} color={on ? colors.primary : colors.textMuted} />
      <View style={styles.text}>
        <AppText variant="label">Count a day only after a symptom-free next morning</AppText>
        <AppText variant="caption" tone="muted">{on ? 'On: symptoms may come later or the next day.' : 'Off: a day counts once its sessions pass.'}</AppText>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: touchTarget },
  text: { flex: 1 },
});

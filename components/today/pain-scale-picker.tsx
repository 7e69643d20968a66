import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { fonts, fontSizes, radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';
import { painWord } from './scale-words';

const SCORES = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

export interface PainScalePickerProps {
  value: number | null;
  onChange: (pain: number) => void;
  testIDPrefix: string;
  label?: string;
}

/** Pain 0-10 as big buttons, with the scale's words; the chosen one carries a tick and its word. */
export function PainScalePicker({ value, onChange, testIDPrefix, label = 'Pain right now, 0 to 10' }: PainScalePickerProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.wrap}>
      <AppText variant="bodyStrong">{label}</AppText>
      <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.grid}>
        {SCORES.map((score) => {
          const selected = value === score;
          return (
            <Pressable
              key={score}
              testID={`${testIDPrefix}-${score}`}
              accessibilityRole="radio"
              accessibilityLabel={`Pain ${score} of 10: ${painWord(score)}`}
              aria-checked={selected}
              onPress={() => onChange(score)}
              style={[
                styles.cell,
                { borderColor: selected ? colors.primary : colors.borderStrong, backgroundColor: selected ? colors.primary : colors.surface },
              ]}
            >
              {selected ? <Icon name="checkmark" size={14} color={colors.onPrimary} /> : null}
              <AppText style={[styles.number, { color: selected ? colors.onPrimary : colors.text }]}>{String(score)}</AppText>
            </Pressable>
          );
        })}
      </View>
      <View style={styles.legend}>
        <AppText variant="caption" tone="muted">0 none · 1-4 mild · 5-6 moderate · 7-10 severe</AppText>
      </View>
      <AppText testID={`${testIDPrefix}-word`} variant="bodyStrong" tone={value !== null && value > 0 ? 'warning' : 'default'}>
        {value === null ? 'Choose a number' : `${value}: ${painWord(value)}`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  cell: {
    minWidth: 52,
    minHeight: 52,
    flexGrow: 1,
    flexBasis: 52,
    maxWidth: 72,
    borderWidth: 2,
    borderRadius: radii.md,
    alignItems: 'center',
    justifyContent: 'center',
    flexDirection: 'row',
    gap: 2,
  },
  number: { fontFamily: fonts.bold, fontSize: fontSizes.xl },
  legend: { minHeight: touchTarget / 2 },
});

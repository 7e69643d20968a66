import { Pressable, StyleSheet, View } from 'react-native';
import { fonts, fontSizes, radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';
import { effortWord } from './scale-words';

const SCORES = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

export interface EffortPickerProps {
  value: number | null;
  onChange: (effort: number) => void;
}

/** How hard the whole session felt, on the CR-10 scale (Foster et al. 2001), with its words. */
export function EffortPicker({ value, onChange }: EffortPickerProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.wrap}>
      <AppText variant="bodyStrong">How hard was the session? (0-10)</AppText>
      <View accessibilityRole="radiogroup" accessibilityLabel="Session effort, 0 to 10" style={styles.grid}>
        {SCORES.map((score) => {
          const selected = value === score;
          return (
            <Pressable
              key={score}
              testID={`effort-${score}`}
              accessibilityRole="radio"
              accessibilityLabel={`Effort ${score}: ${effortWord(score)}`}
              aria-checked={selected}
              onPress={() => onChange(score)}
              style={[styles.cell, { borderColor: selected ? colors.primary : colors.borderStrong, backgroundColor: selected ? colors.primary : colors.surface }]}
            >
              <AppText style={[styles.number, { color: selected ? colors.onPrimary : colors.text }]}>{String(score)}</AppText>
            </Pressable>
          );
        })}
      </View>
      <AppText testID="effort-word" variant="bodyStrong">
        {value === null ? 'Choose a number' : `${value}: ${effortWord(value)}`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  cell: { minWidth: 52, minHeight: 52, flexGrow: 1, flexBasis: 52, maxWidth: 72, borderWidth: 2, borderRadius: radii.md, alignItems: 'center', justifyContent: 'center' },
  number: { fontFamily: fonts.bold, fontSize: fontSizes.xl },
});

import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface ChipOption<V extends string | number> {
  value: V;
  label: string;
  testID: string;
}

export interface ChoiceChipsProps<V extends string | number> {
  label: string;
  options: readonly ChipOption<V>[];
  selected: readonly V[];
  onToggle: (value: V) => void;
  /** One choice (radio) or several (checkbox). */
  multiple?: boolean;
  error?: string;
  testID?: string;
}

/** A wrapping row of choices for when a segmented control has too many; chosen ones carry a tick. */
export function ChoiceChips<V extends string | number>({ label, options, selected, onToggle, multiple = false, error, testID }: ChoiceChipsProps<V>) {
  const { colors } = useTheme();
  return (
    <View style={styles.wrap} testID={testID}>
      <AppText variant="label">{label}</AppText>
      <View accessibilityRole={multiple ? undefined : 'radiogroup'} accessibilityLabel={label} style={styles.row}>
        {options.map((option) => {
          const on = selected.includes(option.value);
          return (
            <Pressable
              key={String(option.value)}
              testID={option.testID}
              accessibilityRole={multiple ? 'checkbox' : 'radio'}
              accessibilityLabel={option.label}
              aria-checked={on}
              onPress={() => onToggle(option.value)}
              style={[styles.chip, { borderColor: on ? colors.primary : colors.borderStrong, backgroundColor: on ? colors.primary : colors.surface }]}
            >
              {on ? <Icon name="checkmark" size={16} color={colors.onPrimary} /> : null}
              <AppText variant="label" style={{ color: on ? colors.onPrimary : colors.text }}>
                {option.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <AppText variant="caption" tone="danger" testID={testID ? `${testID}-error` : undefined}>
          {error}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  chip: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    paddingHorizontal: spacing.md,
    borderWidth: 1,
    borderRadius: radii.pill,
  },
});

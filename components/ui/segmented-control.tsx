import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface SegmentOption<V extends string> {
  value: V;
  label: string;
  testID: string;
}

export interface SegmentedControlProps<V extends string> {
  label: string;
  options: readonly SegmentOption<V>[];
  value: V;
  onChange: (value: V) => void;
}

/** A choice of one among a few; the chosen one carries a tick as well as a fill. */
export function SegmentedControl<V extends string>({ label, options, value, onChange }: SegmentedControlProps<V>) {
  const { colors } = useTheme();
  return (
    <View style={styles.wrap}>
      <AppText variant="label">{label}</AppText>
      <View accessibilityRole="radiogroup" accessibilityLabel={label} style={[styles.row, { borderColor: colors.borderStrong }]}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              testID={option.testID}
              accessibilityRole="radio"
              accessibilityLabel={option.label}
              aria-checked={selected}
              onPress={() => onChange(option.value)}
              style={[styles.segment, { backgroundColor: selected ? colors.primary : colors.surface }]}
            >
              {selected ? <Icon name="checkmark" size={16} color={colors.onPrimary} /> : null}
              <AppText variant="label" style={{ color: selected ? colors.onPrimary : colors.text }}>
                {option.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', borderWidth: 1, borderRadius: radii.md, overflow: 'hidden' },
  segment: {
    flex: 1,
    minHeight: touchTarget,
    flexDirection: 'row',
    gap: spacing.xs,
    alignItems: 'center',
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
  },
});

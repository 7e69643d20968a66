import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { formatPlanDate } from '@/lib/plan-dates';
import { AppText } from '@/components/ui/text';

export interface ClearanceMarkProps {
  cleared: boolean;
  expectedOn: string | null;
  /** The view's own date: a projection already behind it is not shown as a date. */
  asOf: string;
  testID?: string;
}

/** Cleared or not yet, told by an icon and words; a not-yet date is labelled as a projection. */
export function ClearanceMark({ cleared, expectedOn, asOf, testID }: ClearanceMarkProps) {
  const { colors } = useTheme();
  const text = cleared
    ? 'Cleared now'
    : expectedOn && expectedOn > asOf
      ? `Not yet · projected ${formatPlanDate(expectedOn)}`
      : 'Not yet · no date for now';
  return (
    <View style={styles.row} testID={testID}>
      <Icon
        name={cleared ? 'checkmark-circle' : 'ellipse-outline'}
        size={18}
        color={cleared ? colors.success : colors.textMuted}
        style={styles.icon}
      />
      <AppText variant={cleared ? 'bodyStrong' : 'body'} tone={cleared ? 'success' : 'muted'} style={styles.text}>
        {text}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  icon: { marginTop: 3 },
  text: { flexShrink: 1 },
});

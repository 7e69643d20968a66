import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CheckInRow } from '@/shared/schemas/record';
import { AppText } from '@/components/ui/text';
import { painWords, redFlagWords } from './check-in-words';

/** Pain in numbers and words; an icon and the word "over" mark a failed gate, never colour alone. */
export function PainCell({ row }: { row: CheckInRow }) {
  const { colors } = useTheme();
  const flagged = row.overThreshold || row.redFlags.length > 0;
  return (
    <View style={styles.cell}>
      <View style={styles.line}>
        {flagged ? <Icon name="alert-circle" size={14} color={colors.danger} /> : null}
        <AppText variant="caption" tone={flagged ? 'danger' : 'default'}>
          {painWords(row)}
        </AppText>
      </View>
      {row.redFlags.length > 0 ? (
        <AppText variant="caption" tone="danger">{`Red flag: ${redFlagWords(row)}`}</AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  cell: { gap: spacing.xxs },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

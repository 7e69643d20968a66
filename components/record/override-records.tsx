import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { OverrideRecord } from '@/shared/schemas/plan';
import { AppText } from '@/components/ui/text';
import { overrideWords } from './override-form';

const day = (date: string) => format(parseISO(date), 'EEE d MMM');

/** Every override, with who decided it, when, and why. */
export function OverrideRecords({ overrides }: { overrides: readonly OverrideRecord[] }) {
  const { colors } = useTheme();
  if (overrides.length === 0) return <AppText tone="muted">No overrides recorded.</AppText>;
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="override-records">
      {overrides.map((record, position) => (
        <View key={record.id} style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]} testID="override-record">
          <AppText variant="label">{`${overrideWords[record.action]} · from ${day(record.date)}`}</AppText>
          <AppText variant="caption">{`Reason: ${record.reason}`}</AppText>
          <AppText variant="caption" tone="muted">{`${record.by}, ${format(new Date(record.at), 'd MMM yyyy HH:mm')}`}</AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: spacing.md, gap: spacing.xxs },
});

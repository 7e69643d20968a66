import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import type { CheckInRow } from '@/shared/schemas/record';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { checkInKind } from './check-in-words';
import { PainCell } from './pain-cell';

/** One check-in on a phone. */
export function CheckInItem({ row }: { row: CheckInRow }) {
  return (
    <Card testID="check-in-row">
      <View style={styles.head}>
        <AppText variant="bodyStrong">{format(parseISO(row.date), 'EEE d MMM')}</AppText>
        <AppText variant="caption" tone="muted">{checkInKind(row)}</AppText>
      </View>
      {row.minutesPlayed !== null ? (
        <AppText variant="caption">{`${row.minutesPlayed} min played${row.effort !== null ? ` · effort ${row.effort} of 10` : ''}`}</AppText>
      ) : null}
      <PainCell row={row} />
      {row.note ? <AppText variant="caption" tone="muted">{`“${row.note}”`}</AppText> : null}
    </Card>
  );
}

const styles = StyleSheet.create({ head: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.sm } });

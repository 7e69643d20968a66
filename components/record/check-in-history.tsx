import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useCheckInRowsQuery } from '@/hooks/use-record';
import type { CheckInRow } from '@/shared/schemas/record';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';
import { CheckInItem } from './check-in-item';
import { checkInKind } from './check-in-words';
import { PainCell } from './pain-cell';

const columns: TableColumn<CheckInRow>[] = [
  { key: 'date', header: 'Date', flex: 2, render: (row) => <AppText variant="caption">{format(parseISO(row.date), 'EEE d MMM')}</AppText> },
  { key: 'kind', header: 'Check', flex: 2, render: (row) => <AppText variant="caption">{checkInKind(row)}</AppText> },
  { key: 'minutes', header: 'Minutes', flex: 1, render: (row) => <AppText variant="caption">{row.minutesPlayed === null ? '–' : String(row.minutesPlayed)}</AppText> },
  { key: 'effort', header: 'Effort', flex: 1, render: (row) => <AppText variant="caption">{row.effort === null ? '–' : `${row.effort}/10`}</AppText> },
  { key: 'pain', header: 'Highest pain', flex: 3, render: (row) => <PainCell row={row} /> },
  { key: 'note', header: 'Note', flex: 3, render: (row) => <AppText variant="caption" tone="muted">{row.note ?? ''}</AppText> },
];

/** Every check-in, newest first: a table on wide screens, cards on a phone. */
export function CheckInHistory({ id }: { id: string }) {
  const rows = useCheckInRowsQuery(id);
  const { isMedium } = useBreakpoints();
  let body;
  if (rows.isPending) body = <LoadingState label="Loading check-ins…" />;
  else if (rows.isError) body = <ErrorState error={rows.error} onRetry={() => rows.refetch()} testID="check-ins-error" />;
  else if (rows.data.length === 0) body = <AppText tone="muted" testID="check-ins-empty">No check-ins yet.</AppText>;
  else if (isMedium) {
    body = <Table testID="check-in-table" rowTestID="check-in-row" label="Check-in history" columns={columns} rows={rows.data} rowKey={(row) => row.id} />;
  } else {
    body = (
      <View style={styles.list} testID="check-in-list">
        {rows.data.map((row) => (
          <CheckInItem key={row.id} row={row} />
        ))}
      </View>
    );
  }
  return (
    <Section title="Check-in history" description="Sessions, next-morning checks and pain reports, newest first." testID="record-check-ins">
      {body}
    </Section>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.sm } });

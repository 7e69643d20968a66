import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useCaseloadQuery } from '@/hooks/use-musicians';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';
import { AlertList } from './alert-list';
import { CaseloadCard } from './caseload-card';
import type { CaseloadShow } from './caseload-controls';
import { EventCell } from './event-cell';
import { LastCheckIn } from './last-check-in';
import { PlanCell } from './plan-cell';
import { RecordLink } from './record-link';
import { sortCaseload, type CaseloadSort } from './sort-caseload';

const columns: TableColumn<CaseloadEntry>[] = [
  {
    key: 'name',
    header: 'Musician',
    flex: 3,
    render: (entry) => (
      <View>
        <RecordLink entry={entry} />
        <AppText variant="caption" tone="muted" numberOfLines={1}>
          {entry.joined ? entry.instrument : `${entry.instrument} · invitation sent`}
        </AppText>
      </View>
    ),
  },
  { key: 'alerts', header: 'Alerts', flex: 3, render: (entry) => <AlertList alerts={entry.alerts} compact /> },
  { key: 'plan', header: 'Stage and status', flex: 3, render: (entry) => <PlanCell entry={entry} /> },
  { key: 'event', header: 'Event', flex: 3, render: (entry) => <EventCell entry={entry} /> },
  { key: 'check-in', header: 'Last check-in', flex: 2, render: (entry) => <LastCheckIn date={entry.lastCheckInDate} /> },
];

function queryOf(sort: CaseloadSort, show: CaseloadShow) {
  if (show === 'all') return { sort };
  if (show === 'alerts') return { sort, alerts: 'only' as const };
  return { sort, status: show };
}

/** The clinician's musicians: cards on a phone, a table once the screen is wide enough. */
export function CaseloadList({ sort, show }: { sort: CaseloadSort; show: CaseloadShow }) {
  const caseload = useCaseloadQuery(queryOf(sort, show));
  const { isMedium } = useBreakpoints();

  if (caseload.isPending) return <LoadingState label="Loading your caseload…" />;
  if (caseload.isError) return <ErrorState error={caseload.error} onRetry={() => caseload.refetch()} testID="caseload-error" />;
  if (caseload.data.length === 0) {
    return show === 'all' ? (
      <EmptyState icon="person-add-outline" title="No musicians yet" testID="caseload-empty">
        Invite your first musician with the form: they join your caseload at once and get an e-mail to set a password.
      </EmptyState>
    ) : (
      <EmptyState icon="funnel-outline" title="Nobody matches" testID="caseload-empty-filter">
        No musician in your caseload matches this filter. Choose “Everyone” to see them all.
      </EmptyState>
    );
  }
  const rows = sortCaseload(caseload.data, sort);
  if (isMedium) {
    return (
      <Table testID="caseload-table" rowTestID="caseload-entry" label="Musicians in your caseload" columns={columns} rows={rows} rowKey={(entry) => entry.id} />
    );
  }
  return (
    <View style={styles.cards}>
      {rows.map((entry) => (
        <CaseloadCard key={entry.id} entry={entry} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ cards: { gap: spacing.md } });

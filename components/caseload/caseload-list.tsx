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
import { CaseloadCard } from './caseload-card';
import { JoinedBadge } from './joined-badge';
import { PlanCell } from './plan-cell';

const columns: TableColumn<CaseloadEntry>[] = [
  {
    key: 'name',
    header: 'Musician',
    flex: 3,
    render: (entry) => (
      <View>
        <AppText variant="bodyStrong">{entry.name}</AppText>
        <AppText variant="caption" tone="muted" numberOfLines={1}>
          {entry.email}
        </AppText>
      </View>
    ),
  },
  { key: 'instrument', header: 'Instrument', flex: 2, render: (entry) => <AppText>{entry.instrument}</AppText> },
  { key: 'plan', header: 'Plan', flex: 3, render: (entry) => <PlanCell entry={entry} /> },
  { key: 'status', header: 'Account', flex: 2, render: (entry) => <JoinedBadge entry={entry} /> },
];

/** The clinician's musicians: cards on a phone, a table once the screen is wide enough. */
export function CaseloadList() {
  const caseload = useCaseloadQuery();
  const { isMedium } = useBreakpoints();

  if (caseload.isPending) return <LoadingState label="Loading your caseload…" />;
  if (caseload.isError) return <ErrorState error={caseload.error} onRetry={() => caseload.refetch()} testID="caseload-error" />;
  if (caseload.data.length === 0) {
    return (
      <EmptyState icon="person-add-outline" title="No musicians yet" testID="caseload-empty">
        Invite your first musician with the form: they join your caseload at once and get an e-mail to set a password.
      </EmptyState>
    );
  }
  if (isMedium) {
    return (
      <Table
        testID="caseload-table"
        rowTestID="caseload-entry"
        label="Musicians in your caseload"
        columns={columns}
        rows={caseload.data}
        rowKey={(entry) => entry.id}
      />
    );
  }
  return (
    <View style={styles.cards}>
      {caseload.data.map((entry) => (
        <CaseloadCard key={entry.id} entry={entry} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ cards: { gap: spacing.md } });

import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { AuditEntry } from '@/shared/schemas/audit';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';

// Our words for what was done; an unknown action shows as recorded.
const ACTIONS: Record<string, string> = {
  'record.read': 'Read the record',
  'profile.updated': 'Edited the profile',
  'note.added': 'Added a note',
  'document.uploaded': 'Uploaded a document',
  'document.updated': 'Changed a document',
  'document.deleted': 'Deleted a document',
  'document.downloaded': 'Downloaded a document',
  'plan.draft_created': 'Drafted a plan version',
  'plan.draft_updated': 'Edited a draft plan',
  'plan.draft_deleted': 'Deleted a draft plan',
  'plan.activated': 'Activated a plan version',
  'override.advance': 'Moved the plan up',
  'override.hold': 'Held the plan',
  'override.resume': 'Resumed the plan',
  'override.step_back': 'Stepped the plan back',
  'override.clear_red_flag': 'Cleared a red flag',
  'share.created': 'Shared clearance with a teacher',
  'share.invited': 'Invited a teacher to see clearance',
  'share.stopped': 'Stopped sharing with a teacher',
  'share.invitation_withdrawn': 'Withdrew a teacher invitation',
};

// Which part of the record a read was of: the segment after /api/musicians/:id.
const PARTS: Record<string, string> = {
  profile: 'the profile',
  notes: 'the notes',
  'check-ins': 'the check-ins',
  chart: 'the chart',
  load: 'the load',
  plan: 'the plan',
  plans: 'the plan versions',
  pieces: 'the repertoire',
  setup: 'the setup',
  documents: 'the documents',
  shares: 'who it is shared with',
  audit: 'this activity',
};

function what(entry: AuditEntry): string {
  const path = entry.detail.path;
  if (entry.action === 'record.read' && typeof path === 'string') {
    const part = path.split('/')[4];
    return part ? `Read ${PARTS[part] ?? part}` : 'Read the record';
  }
  return ACTIONS[entry.action] ?? entry.action;
}
const when = (entry: AuditEntry) => format(new Date(entry.at), 'd MMM yyyy, HH:mm');

const columns: TableColumn<AuditEntry>[] = [
  { key: 'at', header: 'When', flex: 2, render: (entry) => <AppText tone="muted">{when(entry)}</AppText> },
  { key: 'who', header: 'Who', flex: 2, render: (entry) => <AppText variant="bodyStrong">{entry.actorName ?? 'A removed account'}</AppText> },
  { key: 'what', header: 'What', flex: 3, render: (entry) => <AppText>{what(entry)}</AppText> },
  { key: 'whose', header: 'Whose record', flex: 2, render: (entry) => <AppText>{entry.musicianName ?? '—'}</AppText> },
];

/** Who did what to whose record and when, newest first. */
export function AuditList({ query }: { query: { isPending: boolean; isError: boolean; error: unknown; data?: AuditEntry[]; refetch: () => unknown } }) {
  const { isMedium } = useBreakpoints();
  if (query.isPending) return <LoadingState label="Loading the audit trail…" />;
  if (query.isError || !query.data) return <ErrorState error={query.error} onRetry={() => query.refetch()} testID="audit-error" />;
  if (query.data.length === 0) {
    return (
      <EmptyState icon="document-text-outline" title="Nothing recorded yet" testID="audit-empty">
        Reads of records and changes to plans, overrides, notes, documents and sharing appear here.
      </EmptyState>
    );
  }
  if (isMedium) {
    return <Table testID="audit-table" rowTestID="audit-row" label="Audit trail" columns={columns} rows={query.data} rowKey={(entry) => entry.id} />;
  }
  return (
    <View style={styles.cards}>
      {query.data.map((entry) => (
        <Card key={entry.id} testID="audit-row">
          <AppText variant="bodyStrong">{what(entry)}</AppText>
          <AppText tone="muted">{`${entry.actorName ?? 'A removed account'} · ${entry.musicianName ?? '—'}`}</AppText>
          <AppText variant="caption" tone="muted">{when(entry)}</AppText>
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.md },
});

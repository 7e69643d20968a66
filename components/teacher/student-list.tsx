import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useStudentsQuery } from '@/hooks/use-students';
import type { StudentSummary } from '@/shared/schemas/clearance';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';
import { EventCountdown } from './event-countdown';
import { ReadinessBadge } from './readiness-badge';
import { StudentCard } from './student-card';
import { StudentNameLink } from './student-name-link';

const columns: TableColumn<StudentSummary>[] = [
  { key: 'name', header: 'Student', flex: 2, render: (student) => <StudentNameLink student={student} /> },
  { key: 'instrument', header: 'Instrument', flex: 1.5, render: (student) => <AppText>{student.instrument}</AppText> },
  { key: 'event', header: 'Event', flex: 3, render: (student) => <EventCountdown event={student.event} asOf={student.asOf} /> },
  { key: 'readiness', header: 'Readiness', flex: 1.5, render: (student) => <ReadinessBadge readiness={student.readiness} /> },
];

/** Students who shared their clearance with this teacher: instrument, event and readiness in plain words. */
export function StudentList() {
  const { isMedium } = useBreakpoints();
  const students = useStudentsQuery();

  if (students.isPending) return <LoadingState label="Loading your students…" />;
  if (students.isError) return <ErrorState error={students.error} onRetry={() => students.refetch()} testID="students-error" />;
  if (students.data.length === 0) {
    return (
      <EmptyState icon="school-outline" title="No students have shared with you yet" testID="students-empty">
        When a student shares their playing clearance with you, they appear here.
      </EmptyState>
    );
  }
  if (isMedium) {
    return (
      <Table testID="students-table" rowTestID="student-row" label="Your students" columns={columns} rows={students.data} rowKey={(s) => s.id} />
    );
  }
  return (
    <View style={styles.cards} testID="students-cards">
      {students.data.map((student) => (
        <StudentCard key={student.id} student={student} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ cards: { gap: spacing.md } });

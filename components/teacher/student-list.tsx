import { StyleSheet, View } from 'react-native';
import Ionicons from '@expo/vector-icons/Ionicons';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useStudentsQuery } from '@/hooks/use-students';
import { useTheme } from '@/hooks/use-theme';
import type { Student } from '@/shared/schemas/musician';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';

const columns: TableColumn<Student>[] = [
  { key: 'name', header: 'Student', flex: 2, render: (student) => <AppText variant="bodyStrong">{student.name}</AppText> },
  { key: 'instrument', header: 'Instrument', flex: 2, render: (student) => <AppText>{student.instrument}</AppText> },
];

/** Students who shared their clearance with this teacher: names and instruments only. */
export function StudentList() {
  const { colors } = useTheme();
  const { isMedium } = useBreakpoints();
  const students = useStudentsQuery();

  if (students.isPending) return <LoadingState label="Loading your students…" />;
  if (students.isError) return <ErrorState error={students.error} onRetry={() => students.refetch()} testID="students-error" />;
  if (students.data.length === 0) {
    return (
      <EmptyState icon="school-outline" title="No students have shared with you yet" testID="students-empty">
        When a student’s clinician shares their clearance with you, the student appears here.
      </EmptyState>
    );
  }
  if (isMedium) {
    return (
      <Table testID="students-table" rowTestID="student-row" label="Your students" columns={columns} rows={students.data} rowKey={(s) => s.id} />
    );
  }
  return (
    <View style={styles.cards}>
      {students.data.map((student) => (
        <Card key={student.id} testID="student-row">
          <AppText variant="heading">{student.name}</AppText>
          <View style={styles.line}>
            <Ionicons name="musical-note-outline" size={16} color={colors.textMuted} />
            <AppText tone="muted">{student.instrument}</AppText>
          </View>
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.md },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

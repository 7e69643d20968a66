import { Pressable, StyleSheet } from 'react-native';
import { Link } from 'expo-router';
import { touchTarget } from '@/constants/theme';
import type { StudentSummary } from '@/shared/schemas/clearance';
import { AppText } from '@/components/ui/text';

/** The student's name in the wide table, as the link to their clearance. */
export function StudentNameLink({ student }: { student: Pick<StudentSummary, 'id' | 'name'> }) {
  return (
    <Link href={`/students/${student.id}`} asChild>
      <Pressable
        testID={`student-open-${student.id}`}
        accessibilityRole="link"
        accessibilityLabel={`Open ${student.name}’s playing clearance`}
        style={styles.hit}
      >
        <AppText variant="bodyStrong" tone="primary" style={styles.text}>
          {student.name}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  hit: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
});

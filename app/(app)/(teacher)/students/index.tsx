import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { StudentList } from '@/components/teacher/student-list';

export default function StudentsScreen() {
  return (
    <Screen
      testID="screen-students"
      title="Your students"
      lead="Students who are returning to playing after an injury and shared their progress with you."
    >
      <StudentList />
      <Banner tone="info" title="What you will see here">
        For each student: the repertoire cleared now, how long they may play in a lesson or rehearsal, and when more is expected. Medical details stay between the student and their clinician.
      </Banner>
    </Screen>
  );
}

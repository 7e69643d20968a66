import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { StudentList } from '@/components/layout/lazy-screens';

export default function StudentsScreen() {
  return (
    <Screen
      testID="screen-students"
      title="Your students"
      lead="Students who shared their playing clearance with you. Open one to see what they may play now."
    >
      <StudentList />
      <Banner tone="info" title="What you will see here">
        For each student: the repertoire cleared now, how long they may play in a lesson or rehearsal, and when more is expected. Medical details stay between the student and their clinician.
      </Banner>
    </Screen>
  );
}

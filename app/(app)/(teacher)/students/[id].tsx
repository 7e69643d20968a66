import { useLocalSearchParams } from 'expo-router';
import { StudentClearanceView } from '@/components/teacher/student-clearance-view';

export default function StudentClearanceScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StudentClearanceView studentId={typeof id === 'string' ? id : ''} />;
}

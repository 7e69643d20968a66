import { useLocalSearchParams } from 'expo-router';
import { StudentClearanceView } from '@/components/layout/lazy-screens';

export default function StudentClearanceScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StudentClearanceView studentId={typeof id === 'string' ? id : ''} />;
}

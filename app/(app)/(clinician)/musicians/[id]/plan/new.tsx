import { useLocalSearchParams } from 'expo-router';
import { PlanBuilderScreen } from '@/components/layout/lazy-screens';

export default function NewPlanVersionScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PlanBuilderScreen musicianId={id} />;
}

import { useLocalSearchParams } from 'expo-router';
import { PlanBuilderScreen } from '@/components/layout/lazy-screens';

export default function EditPlanVersionScreen() {
  const { id, planId } = useLocalSearchParams<{ id: string; planId: string }>();
  return <PlanBuilderScreen musicianId={id} planId={planId} />;
}

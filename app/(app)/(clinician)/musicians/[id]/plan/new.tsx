import { useLocalSearchParams } from 'expo-router';
import { PlanBuilderScreen } from '@/components/plan-builder/plan-builder-screen';

export default function NewPlanVersionScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PlanBuilderScreen musicianId={id} />;
}

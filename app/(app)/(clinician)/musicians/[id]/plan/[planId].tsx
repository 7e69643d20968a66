import { useLocalSearchParams } from 'expo-router';
import { PlanBuilderScreen } from '@/components/plan-builder/plan-builder-screen';

export default function EditPlanVersionScreen() {
  const { id, planId } = useLocalSearchParams<{ id: string; planId: string }>();
  return <PlanBuilderScreen musicianId={id} planId={planId} />;
}

import { MyPlanView } from '@/components/my-plan/my-plan-view';

export default function MyPlanScreen() {
  return <MyPlanView />;
}

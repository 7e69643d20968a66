import { MyPlanView } from '@/components/layout/lazy-screens';

export default function MyPlanScreen() {
  return <MyPlanView />;
}

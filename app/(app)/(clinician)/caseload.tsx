import { CaseloadView } from '@/components/layout/lazy-screens';

export default function CaseloadScreen() {
  return <CaseloadView />;
}

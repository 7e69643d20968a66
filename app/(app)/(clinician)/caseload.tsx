import { CaseloadView } from '@/components/caseload/caseload-view';

export default function CaseloadScreen() {
  return <CaseloadView />;
}

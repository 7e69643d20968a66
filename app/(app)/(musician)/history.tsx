import { HistoryView } from '@/components/layout/lazy-screens';

export default function HistoryScreen() {
  return <HistoryView />;
}

import { HistoryView } from '@/components/history/history-view';

export default function HistoryScreen() {
  return <HistoryView />;
}

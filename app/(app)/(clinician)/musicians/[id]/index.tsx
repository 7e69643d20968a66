import { useLocalSearchParams } from 'expo-router';
import { RecordView } from '@/components/layout/lazy-screens';
import { isRecordTab } from '@/components/record/record-tabs';

export default function MusicianRecordScreen() {
  const { id, tab } = useLocalSearchParams<{ id: string; tab?: string }>();
  return <RecordView id={id} initialTab={isRecordTab(tab) ? tab : 'progress'} />;
}

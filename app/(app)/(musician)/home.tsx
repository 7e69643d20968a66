import { useLocalSearchParams } from 'expo-router';
import { TodayView } from '@/components/layout/lazy-screens';

/** The musician's landing: today. `speed` is handed on to a started session's clock (tests, demos). */
export default function TodayScreen() {
  const { speed } = useLocalSearchParams<{ speed?: string }>();
  const value = Number.parseFloat(speed ?? '1');
  return <TodayView speed={Number.isFinite(value) ? Math.min(3600, Math.max(1, value)) : 1} />;
}

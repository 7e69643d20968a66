import { useLocalSearchParams } from 'expo-router';
import { SessionScreen } from '@/components/layout/lazy-screens';

/** /session?index=0 runs one of today's sessions; `speed` multiplies its clock (tests, demonstrations). */
export default function SessionRoute() {
  const params = useLocalSearchParams<{ index?: string; speed?: string }>();
  const index = Number.parseInt(params.index ?? '0', 10);
  const speed = Number.parseFloat(params.speed ?? '1');
  return <SessionScreen sessionIndex={Number.isFinite(index) ? index : 0} speed={Number.isFinite(speed) ? Math.min(3600, Math.max(1, speed)) : 1} />;
}

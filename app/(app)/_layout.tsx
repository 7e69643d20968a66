import { SessionGate } from '@/components/layout/session-gate';

export default function SignedInLayout() {
  return <SessionGate />;
}

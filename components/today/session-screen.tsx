import { useRef } from 'react';
import { useRouter } from 'expo-router';
import type { DaySession, Today } from '@/shared/schemas/today';
import { useTodayQuery } from '@/hooks/use-today';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Button } from '@/components/ui/button';
import { SessionRunner } from './session-runner';

export interface SessionScreenProps {
  sessionIndex: number;
  speed: number;
}

/** Loads today and runs the chosen session; back to Today when it is closed or not available. */
export function SessionScreen({ sessionIndex, speed }: SessionScreenProps) {
  const router = useRouter();
  const today = useTodayQuery();
  // The runner owns the session once started: a refetch after the check-in must not unmount it.
  const session = today.data?.sessions.find((s) => s.index === sessionIndex);
  const started = useRef<{ today: Today; session: DaySession } | null>(null);
  if (!started.current && today.data && session && !session.done) started.current = { today: today.data, session };
  const close = () => router.replace('/home');
  if (started.current) return <SessionRunner today={started.current.today} session={started.current.session} speed={speed} onClose={close} />;
  if (today.isPending) return <LoadingState label="Loading your session…" />;
  if (today.isError) return <ErrorState error={today.error} onRetry={() => today.refetch()} testID="session-error" />;
  return (
    <Screen testID="screen-session-missing" title="No session to run" lead="This session is already done or no longer on today’s programme.">
      <Button testID="session-missing-back" label="Back to today" icon="arrow-back" onPress={close} />
    </Screen>
  );
}

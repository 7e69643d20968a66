import { useRef, useState } from 'react';
import { useRouter } from 'expo-router';
import type { DaySession, Today } from '@/shared/schemas/today';
import { useMeQuery } from '@/hooks/use-me';
import { useTodayQuery } from '@/hooks/use-today';
import type { KeyValueStore } from '@/lib/local-store';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Button } from '@/components/ui/button';
import type { SessionState } from './session-machine';
import { clearProgress, progressStore, restoreProgress, saveProgress, snapshotOf, type ProgressKey } from './session-progress';
import { SessionRunner } from './session-runner';

export interface SessionScreenProps {
  sessionIndex: number;
  speed: number;
  /** Where the place in a session is kept; the device's storage unless a test gives one. */
  store?: KeyValueStore;
  /** The clock, injectable for tests. */
  now?: () => number;
}

interface Started {
  today: Today;
  session: DaySession;
  key: ProgressKey;
  restored: SessionState | null;
}

/** Loads today and runs the chosen session, from its kept place if it was left earlier today. */
export function SessionScreen({ sessionIndex, speed, store = progressStore(), now }: SessionScreenProps) {
  const router = useRouter();
  const today = useTodayQuery();
  const me = useMeQuery();
  const [run, setRun] = useState(0);
  // The runner owns the session once started: a refetch after the check-in must not unmount it.
  const session = today.data?.sessions.find((s) => s.index === sessionIndex);
  const started = useRef<Started | null>(null);
  if (!started.current && today.data && session && !session.done && me.data) {
    const key = { musicianId: me.data.id, date: today.data.date, sessionIndex };
    const threshold = today.data.painThreshold.session;
    started.current = { today: today.data, session, key, restored: restoreProgress(store, key, session, { threshold, speed })?.state ?? null };
  }
  const close = () => router.replace('/home');
  if (started.current) {
    const { key, today: day, session: running, restored } = started.current;
    return (
      <SessionRunner
        key={run}
        today={day}
        session={running}
        speed={speed}
        now={now}
        onClose={close}
        restored={restored}
        onProgress={(state, at) => {
          const snapshot = snapshotOf(key, running, state, at);
          if (snapshot) saveProgress(store, snapshot);
          else clearProgress(store, key);
        }}
        onSent={() => clearProgress(store, key)}
        onStartOver={() => {
          clearProgress(store, key);
          if (started.current) started.current = { ...started.current, restored: null };
          setRun((n) => n + 1);
        }}
      />
    );
  }
  if (today.isPending || me.isPending) return <LoadingState label="Loading your session…" />;
  if (today.isError) return <ErrorState error={today.error} onRetry={() => today.refetch()} testID="session-error" />;
  if (me.isError) return <ErrorState error={me.error} onRetry={() => me.refetch()} testID="session-error" />;
  return (
    <Screen testID="screen-session-missing" title="No session to run" lead="This session is already done or no longer on today’s programme.">
      <Button testID="session-missing-back" label="Back to today" icon="arrow-back" onPress={close} />
    </Screen>
  );
}

import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useCheckInQueue } from '@/hooks/use-check-ins';
import { useMeQuery } from '@/hooks/use-me';
import { useMusicianHomeQuery } from '@/hooks/use-musician-home';
import { useTodayQuery } from '@/hooks/use-today';
import { isApiError } from '@/lib/api-client';
import type { KeyValueStore } from '@/lib/local-store';
import { Button } from '@/components/ui/button';
import { CautionCard } from '@/components/ui/caution-card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { AppText } from '@/components/ui/text';
import { PlanSummary } from '@/components/musician/plan-summary';
import { ProgressionBadge } from '@/components/plan/progression-badge';
import { CheckOutcome } from './check-outcome';
import { ClearedPieces } from './cleared-pieces';
import { DayStatus } from './day-status';
import { MorningCheck } from './morning-check';
import { PainReportSheet } from './pain-report-sheet';
import { SessionCard } from './session-card';
import { hasProgress, progressStore } from './session-progress';
import { SetupReminders } from './setup-reminders';

/** The musician's landing: the morning check first, then today's sessions, or why there are none. */
export function TodayView({ speed = 1, store = progressStore() }: { speed?: number; store?: KeyValueStore }) {
  const router = useRouter();
  const { isWide } = useBreakpoints();
  const today = useTodayQuery();
  const home = useMusicianHomeQuery();
  // The kept place in a session is keyed by the account, as the session screen keeps it.
  const me = useMeQuery();
  const { submit, outcome } = useCheckInQueue();
  const [reporting, setReporting] = useState(false);
  const [morningKey, setMorningKey] = useState<string | null>(null);
  const data = today.data;
  const noPlan = isApiError(today.error) && today.error.status === 404;
  const asking = data?.morningCheckFor && morningKey === null ? data.morningCheckFor : null;
  const firstOpen = data?.sessions.find((s) => !s.done);
  const start = (index: number) =>
    router.push({ pathname: '/session', params: speed > 1 ? { index: String(index), speed: String(speed) } : { index: String(index) } });

  return (
    <Screen
      testID="screen-musician-home"
      title="Today"
      lead={data ? `${format(parseISO(data.date), 'EEEE d MMMM')} · stage ${data.overview.stageNumber} of ${data.overview.stageCount}` : undefined}
      actions={data ? <Button testID="report-pain" label="Report pain" icon="medkit-outline" variant="secondary" onPress={() => setReporting(true)} /> : null}
      // Below the content, so it waits for the day: shown while loading, it sat under the spinner and was
      // pushed off the screen when the sessions arrived, the page's largest layout shift.
      footer={today.isPending ? null : <CautionCard audience="musician" />}
    >
      {today.isPending ? <LoadingState label="Loading today…" /> : null}
      {today.isError && !noPlan ? <ErrorState error={today.error} onRetry={() => today.refetch()} testID="today-error" /> : null}
      {noPlan && home.data ? <PlanSummary plan={null} clinicianName={home.data.clinicianName} /> : null}
      {data ? (
        <>
          {asking ? (
            <MorningCheck about={asking} onSubmit={(pain, redFlags) => setMorningKey(submit({ kind: 'next_morning', date: data.date, pain, redFlags }))} />
          ) : (
            <>
              {morningKey ? <CheckOutcome outcome={outcome(morningKey)} testID="morning-outcome" /> : null}
              <View style={styles.status}>
                <ProgressionBadge plan={data.overview} testID="today-status" />
                <DayStatus today={data} />
              </View>
              <View style={[styles.grid, isWide && styles.gridWide]}>
                <View style={[styles.main, isWide && styles.mainWide]}>
                  {data.sessions.map((session) => (
                    <SessionCard key={session.index} session={session} canStart={firstOpen?.index === session.index} resumable={me.data ? hasProgress(store, { musicianId: me.data.id, date: data.date, sessionIndex: session.index }, session) : false} onStart={() => start(session.index)} painThreshold={data.painThreshold.session} />
                  ))}
                </View>
                {data.sessions.length > 0 || data.setup.length > 0 ? (
                  <View style={[styles.main, isWide && styles.sideWide]}>
                    {data.sessions.length > 0 ? <ClearedPieces pieces={data.pieces} maxBurstMinutes={data.maxBurstMinutes} /> : null}
                    <SetupReminders items={data.setup} />
                  </View>
                ) : null}
              </View>
            </>
          )}
          <PainReportSheet date={data.date} visible={reporting} onClose={() => setReporting(false)} />
        </>
      ) : null}
      {home.data && !today.isPending ? (
        <AppText variant="caption" tone="muted" testID="musician-profile">
          {`${home.data.name} · ${home.data.instrument} · Clinician: ${home.data.clinicianName}`}
        </AppText>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  status: { gap: spacing.sm },
  grid: { gap: spacing.lg },
  gridWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { gap: spacing.lg },
  mainWide: { flex: 3 },
  sideWide: { flex: 2 },
});
